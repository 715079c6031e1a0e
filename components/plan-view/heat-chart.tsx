"use client";

/**
 * Brake temperature along the route, one line per brake position (front, rear, trailer), on its own axis in
 * °C or °F under the elevation profile and on the same distance scale. The warm and hot lines of the
 * hottest-running position are drawn across; a what-if trace draws dashed over the plan's. Linked hover: the
 * shared distance draws a cursor; pointing at the chart reports the distance there.
 */
import { memo, useMemo } from "react";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { distanceUnit, toDistanceUnit, type UnitSystem } from "@/lib/units";
import { HEAT_COLOURS } from "./heat-colours";

/** A trace to draw: distances and rotor temperatures per position (°C). */
export interface ChartTrace {
  distanceM: ArrayLike<number>;
  rotorC: ArrayLike<number>[];
}

/** Props of {@link HeatChart}. */
export interface HeatChartProps {
  /** Position labels, in trace order ("Front", "Rear", "Caravan"). */
  positions: string[];
  /** Warm and hot lines to draw, °C. */
  warmC: number;
  hotC: number;
  /** The plan's trace. */
  trace: ChartTrace;
  /** A what-if's trace (dashed), if any. */
  whatIf?: ChartTrace | null;
  unitSystem: UnitSystem;
  hoverDistanceM: number | null;
  onHoverDistance?: (distanceM: number | null) => void;
  height?: number;
}

const LINE_COLOURS = ["#16232a", "#1f5a4f", "#7a4b9b"];
const MAX_POINTS = 1200;

const toT = (c: number, system: UnitSystem) => (system === "metric" ? c : (c * 9) / 5 + 32);

/** @private Buckets of the trace, keeping each position's maximum in each bucket (peaks never vanish). */
function rows(trace: ChartTrace, whatIf: ChartTrace | null | undefined, system: UnitSystem) {
  const n = trace.distanceM.length;
  const step = Math.max(1, Math.ceil(n / MAX_POINTS));
  const out: Record<string, number>[] = [];
  const wn = whatIf?.distanceM.length ?? 0;
  let w = 0;
  for (let a = 0; a < n; a += step) {
    const b = Math.min(n, a + step);
    const row: Record<string, number> = { x: toDistanceUnit(trace.distanceM[a] as number, system) };
    trace.rotorC.forEach((col, k) => {
      let m = -Infinity;
      for (let i = a; i < b; i++) m = Math.max(m, col[i] as number);
      row[`p${k}`] = Math.round(toT(m, system));
    });
    if (whatIf && wn) {
      const endM = trace.distanceM[b - 1] as number;
      const best = whatIf.rotorC.map(() => -Infinity);
      const startW = w;
      while (w < wn && (whatIf.distanceM[w] as number) <= endM) {
        whatIf.rotorC.forEach((col, k) => (best[k] = Math.max(best[k]!, col[w] as number)));
        w++;
      }
      if (w === startW && w > 0) whatIf.rotorC.forEach((col, k) => (best[k] = col[w - 1] as number));
      best.forEach((v, k) => Number.isFinite(v) && (row[`w${k}`] = Math.round(toT(v, system))));
    }
    out.push(row);
  }
  return out;
}

/** The temperature chart. Renders a `data-testid="heat-chart"` figure. */
export const HeatChart = memo(function HeatChart({ positions, warmC, hotC, trace, whatIf, unitSystem, hoverDistanceM, onHoverDistance, height = 200 }: HeatChartProps) {
  const data = useMemo(() => rows(trace, whatIf, unitSystem), [trace, whatIf, unitSystem]);
  const unit = unitSystem === "metric" ? "°C" : "°F";
  const xMax = toDistanceUnit((trace.distanceM[trace.distanceM.length - 1] as number) ?? 0, unitSystem);
  return (
    <figure data-testid="heat-chart" aria-label={`Brake temperature along the route in ${unit}, per brake position`} className="m-0">
      <ResponsiveContainer width="100%" height={height}>
        <LineChart
          data={data}
          margin={{ top: 8, right: 12, bottom: 0, left: 0 }}
          onMouseMove={(state) => {
            const x = Number((state as { activeLabel?: number | string }).activeLabel);
            if (Number.isFinite(x)) onHoverDistance?.(unitSystem === "metric" ? x * 1000 : x * 1609.344);
          }}
          onMouseLeave={() => onHoverDistance?.(null)}
        >
          <CartesianGrid stroke="#e3ddd0" vertical={false} />
          <XAxis dataKey="x" type="number" domain={[0, xMax]} tickFormatter={(v: number) => `${Math.round(v)}`} unit={` ${distanceUnit(unitSystem)}`} fontSize={11} />
          <YAxis width={58} fontSize={11} unit={` ${unit}`} allowDecimals={false} />
          <Tooltip
            formatter={(v, name) => {
              const key = String(name);
              const k = Number(key.slice(1));
              return [`${v} ${unit}`, `${positions[k] ?? key}${key.startsWith("w") ? " (what-if)" : ""}`];
            }}
            labelFormatter={(v) => `${Number(v).toFixed(1)} ${distanceUnit(unitSystem)}`}
          />
          <ReferenceLine y={Math.round(toT(warmC, unitSystem))} stroke={HEAT_COLOURS.warm} strokeDasharray="4 3" label={{ value: "caution", position: "insideTopLeft", fontSize: 10, fill: "#8a5d00" }} />
          <ReferenceLine y={Math.round(toT(hotC, unitSystem))} stroke={HEAT_COLOURS.hot} strokeDasharray="4 3" label={{ value: "fade likely", position: "insideTopLeft", fontSize: 10, fill: "#9a3a10" }} />
          {positions.map((p, k) => (
            <Line key={`p${k}`} dataKey={`p${k}`} name={`p${k}`} type="linear" dot={false} isAnimationActive={false} stroke={LINE_COLOURS[k] ?? "#555"} strokeWidth={1.6} />
          ))}
          {whatIf &&
            positions.map((p, k) => (
              <Line key={`w${k}`} dataKey={`w${k}`} name={`w${k}`} type="linear" dot={false} isAnimationActive={false} stroke={LINE_COLOURS[k] ?? "#555"} strokeWidth={1.6} strokeDasharray="5 3" opacity={0.85} />
            ))}
          {hoverDistanceM !== null && <ReferenceLine x={toDistanceUnit(hoverDistanceM, unitSystem)} stroke="#16232a" />}
        </LineChart>
      </ResponsiveContainer>
      <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        {positions.map((p, k) => (
          <span key={p} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-0.5 w-5" style={{ background: LINE_COLOURS[k] ?? "#555" }} />
            {p}
          </span>
        ))}
        {whatIf && <span>Dashed: the what-if</span>}
        <span>Bulk rotor and drum temperatures, estimates.</span>
      </figcaption>
    </figure>
  );
});
