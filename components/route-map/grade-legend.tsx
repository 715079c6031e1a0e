import { cx } from "@/components/ui/cx";
import { distanceUnit, type UnitSystem } from "@/lib/units";
import { gradeColouring, ROUTE_INK, type RouteColouring } from "./grade-colours";

/** Props of {@link GradeLegend}. */
export interface GradeLegendProps {
  /** The colouring whose classes to list; default by grade. */
  colouring?: RouteColouring;
  /** Units named in the marker key. */
  unitSystem: UnitSystem;
  className?: string;
}

/**
 * The key to the map and profile: one swatch per colour class of the current colouring, then the route's
 * marks (descent highlight, distance markers, start and end). A plain list, so screen readers read it too.
 */
export function GradeLegend({ colouring = gradeColouring, unitSystem, className }: GradeLegendProps) {
  return (
    <div className={cx("text-xs text-ink-soft", className)}>
      <p className="mb-1.5 font-semibold text-ink">{colouring.title}</p>
      <ul className="flex flex-wrap gap-x-4 gap-y-1.5">
        {colouring.legend.map((entry) => (
          <li key={entry.id} className="flex items-center gap-1.5">
            <span
              aria-hidden="true"
              className="inline-block h-2.5 w-6 rounded-full"
              style={{ background: entry.colour, boxShadow: `0 0 0 1.5px ${ROUTE_INK.casing}` }}
            />
            {entry.label}
          </li>
        ))}
      </ul>
      <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1.5">
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-3 w-6 rounded-full" style={{ background: ROUTE_INK.descent, opacity: 0.25 }} />
          Descent (wider line, numbered ↓1, ↓2 …)
        </li>
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-grid h-4 min-w-5 place-items-center rounded-md border-2 border-ink bg-white px-0.5 text-[10px] font-semibold leading-none text-ink">
            5
          </span>
          {distanceUnit(unitSystem)} from the start
        </li>
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block size-3 rounded-full border-2 border-white" style={{ background: ROUTE_INK.start, boxShadow: "0 0 0 1px #bfb8a8" }} />
          Start
        </li>
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block size-3 rounded-full border-2 border-white" style={{ background: ROUTE_INK.end, boxShadow: "0 0 0 1px #bfb8a8" }} />
          End
        </li>
      </ul>
    </div>
  );
}
