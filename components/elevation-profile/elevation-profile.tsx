"use client";

/**
 * Elevation against distance in the user's units, coloured stretch by stretch with the same
 * {@link RouteColouring} as the map, descents shaded and numbered. Linked hover: `hoverDistanceM` draws a
 * cursor with a reading (distance, elevation, grade); pointing at the chart (mouse, pen, or a finger dragged
 * sideways) reports the distance there, and leaving reports null. The chart is also a keyboard slider:
 * arrow keys walk along the route, Home and End jump to its ends, Escape clears.
 */
import { type KeyboardEvent, type PointerEvent, useCallback, useMemo, useRef, useState } from "react";
import { cx } from "@/components/ui/cx";
import { gradeColouring, ROUTE_INK, type RouteColouring } from "@/components/route-map/grade-colours";
import type { RouteView } from "@/lib/route";
import { distanceUnit, elevationUnit, formatDistance, formatElevation, toDistanceUnit, toElevationUnit, type UnitSystem } from "@/lib/units";
import { type PlotBox, ProfileChart } from "./profile-chart";
import { chartPoints, gradeInWords, gradientStops, niceScale, profileAt, profileSummary, stretchGrades } from "./profile-data";

/** Props of {@link ElevationProfile}. */
export interface ElevationProfileProps {
  /** The route (SI units). */
  view: RouteView;
  /** Display units of both axes and the reading. */
  unitSystem: UnitSystem;
  /** Distance along the route to put the cursor at, m; null for none. */
  hoverDistanceM: number | null;
  /** Called with the distance under the pointer, m, or null when it leaves. */
  onHoverDistance?: (distanceM: number | null) => void;
  /** How to colour the profile; default by grade. */
  colouring?: RouteColouring;
  /** Chart height, px; default 220 (fits a phone next to the map). */
  height?: number;
  className?: string;
}

/** The elevation profile. Renders a `data-testid="elevation-profile"` figure. */
export function ElevationProfile({
  view,
  unitSystem,
  hoverDistanceM,
  onHoverDistance,
  colouring = gradeColouring,
  height = 220,
  className,
}: ElevationProfileProps) {
  const { profile } = view;
  const totalM = profile.distanceM.at(-1) ?? 0;
  const chart = useMemo(() => {
    const gapsM = view.line.distanceM.filter((_, i) => view.line.gapAfter[i] === 1);
    const grades = stretchGrades(profile, gapsM);
    const points = chartPoints(profile, unitSystem);
    const xMax = toDistanceUnit(totalM, unitSystem);
    const ys = points.map((p) => p.y);
    const lo = Math.min(...ys);
    const hi = Math.max(...ys);
    // Headroom above the highest point keeps the descent labels clear of the line.
    const y = niceScale(lo, hi + Math.max(hi - lo, 20) * 0.22, 6);
    return {
      grades,
      points,
      xMax,
      yDomain: y.domain,
      yTicks: y.ticks,
      stops: gradientStops(profile, grades, colouring),
      descents: view.descents.map((d, i) => ({ from: toDistanceUnit(d.startDistanceM, unitSystem), to: toDistanceUnit(d.endDistanceM, unitSystem), number: i + 1 })),
      gaps: gapsM.map((d) => toDistanceUnit(d, unitSystem)),
    };
  }, [profile, totalM, unitSystem, colouring, view.descents, view.line]);
  const summary = useMemo(() => profileSummary(view, unitSystem), [view, unitSystem]);

  const [plot, setPlot] = useState<PlotBox | null>(null);
  const onPlot = useCallback((p: PlotBox) => setPlot((old) => (old && old.x === p.x && old.y === p.y && old.width === p.width && old.height === p.height ? old : p)), []);
  // About one distance tick per 70 px: a phone gets four or so, a desktop up to twelve.
  const xTickCount = plot ? Math.max(4, Math.min(12, Math.floor(plot.width / 70))) : 6;
  const xTicks = useMemo(() => niceScale(0, chart.xMax, xTickCount, true).ticks.filter((t) => t <= chart.xMax + 1e-9), [chart.xMax, xTickCount]);
  const wrapRef = useRef<HTMLDivElement>(null);

  const distanceAtPointer = (e: PointerEvent<HTMLDivElement>): number | null => {
    const box = wrapRef.current?.getBoundingClientRect();
    if (!box || !plot || plot.width <= 0) return null;
    const t = (e.clientX - box.left - plot.x) / plot.width;
    return Math.min(1, Math.max(0, t)) * totalM;
  };
  const onPointer = (e: PointerEvent<HTMLDivElement>) => onHoverDistance?.(distanceAtPointer(e));
  // A finger lifting off also "leaves"; keep its reading on screen until the next touch.
  const onLeave = (e: PointerEvent<HTMLDivElement>) => e.pointerType === "mouse" && onHoverDistance?.(null);
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = totalM / 100;
    const at = hoverDistanceM ?? 0;
    const next = { ArrowRight: at + step, ArrowUp: at + step, ArrowLeft: at - step, ArrowDown: at - step, PageUp: at + step * 10, PageDown: at - step * 10, Home: 0, End: totalM }[e.key];
    if (e.key === "Escape") onHoverDistance?.(null);
    else if (next !== undefined) onHoverDistance?.(Math.min(totalM, Math.max(0, next)));
    else return;
    e.preventDefault();
  };

  const reading = hoverDistanceM === null ? null : profileAt(profile, chart.grades, hoverDistanceM);
  const readingText = reading
    ? `${formatDistance(reading.distanceM, unitSystem)}: ${formatElevation(reading.elevationM, unitSystem)}, ${gradeInWords(reading.grade)}`
    : "No point selected";
  const [y0, y1] = chart.yDomain;
  const cursor =
    reading && plot && totalM > 0
      ? {
          left: plot.x + (plot.width * reading.distanceM) / totalM,
          top: plot.y + (plot.height * (y1 - toElevationUnit(reading.elevationM, unitSystem))) / (y1 - y0),
        }
      : null;
  const rightHalf = cursor !== null && plot !== null && cursor.left > plot.x + plot.width / 2;

  return (
    <figure data-testid="elevation-profile" className={cx("m-0", className)}>
      <figcaption className="sr-only">{summary}</figcaption>
      <div className="mb-1 flex justify-between text-xs text-ink-muted" aria-hidden="true">
        <span>Elevation, {elevationUnit(unitSystem)}</span>
        <span>Distance, {distanceUnit(unitSystem)}</span>
      </div>
      <div
        ref={wrapRef}
        className="relative cursor-crosshair touch-pan-y select-none rounded-md outline-offset-2"
        style={{ height }}
        onPointerMove={onPointer}
        onPointerDown={onPointer}
        onPointerLeave={onLeave}
        onKeyDown={onKey}
        onBlur={() => onHoverDistance?.(null)}
        tabIndex={0}
        role="slider"
        aria-label="Point along the route (use the arrow keys)"
        aria-valuemin={0}
        aria-valuemax={Math.round(toDistanceUnit(totalM, unitSystem) * 10) / 10}
        aria-valuenow={Math.round(toDistanceUnit(reading?.distanceM ?? 0, unitSystem) * 10) / 10}
        aria-valuetext={readingText}
      >
        <ProfileChart {...chart} xTicks={xTicks} height={height} onPlot={onPlot} />
        {cursor && plot && reading && (
          <div aria-hidden="true" className="pointer-events-none absolute inset-0" data-testid="elevation-profile-cursor" data-distance-m={Math.round(reading.distanceM)}>
            <div className="absolute w-px" style={{ left: cursor.left, top: plot.y, height: plot.height, background: ROUTE_INK.hover }} />
            <div
              className="absolute size-3 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-white"
              style={{ left: cursor.left, top: cursor.top, background: ROUTE_INK.hover, boxShadow: "0 0 0 1px rgb(22 35 42 / 0.5)" }}
            />
            <div
              className={cx(
                "absolute top-1 whitespace-nowrap rounded-md border border-line bg-surface/95 px-2 py-1 text-xs shadow-[var(--shadow-card)]",
                rightHalf ? "-translate-x-full -ml-2" : "ml-2",
              )}
              style={{ left: cursor.left }}
            >
              <p className="font-semibold text-ink">{formatDistance(reading.distanceM, unitSystem)}</p>
              <p className="text-ink-soft">
                {formatElevation(reading.elevationM, unitSystem)} · {gradeInWords(reading.grade)}
              </p>
            </div>
          </div>
        )}
      </div>
    </figure>
  );
}
