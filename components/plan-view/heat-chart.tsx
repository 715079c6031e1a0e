"use client";

/**
 * Brake temperature along the route, one line per brake position (front, rear, trailer), on its own axis in
 * °C or °F under the elevation profile and on the same distance scale. Behind each line, its band (10th–90th
 * percentile of the ensemble, docs/model.md "Uncertainty bands") as a translucent area. The caution and
 * fade-likely lines of the hottest-running position and the model's validity ceiling are drawn across; the
 * axis ends at the highest ceiling and no temperature at or past a ceiling is printed as a number. A what-if
 * trace draws dashed over the plan's, with its own band once it is ready (the plan's band then steps back).
 * Linked hover: the shared distance draws a cursor; pointing at the chart reports the distance there.
 */
import { memo, useMemo } from "react";
import { Area, CartesianGrid, ComposedChart, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { distanceUnit, formatTemperatureBand, type UnitSystem } from "@/lib/units";
import { chartRows, toUserT, yAxis, type ChartBand, type ChartRow, type ChartTrace } from "./heat-chart-data";
import { HEAT_COLOURS } from "./heat-colours";

export type { ChartBand, ChartTrace } from "./heat-chart-data";

/** Props of {@link HeatChart}. */
export interface HeatChartProps {
  /** Position labels, in trace order ("Front", "Rear", "Caravan"). */
  positions: string[];
  /** Warm and hot lines to draw, °C. */
  warmC: number;
  hotC: number;
  /** Each position's validity ceiling, °C (trace order). */
  ceilingsC: number[];
  /** The plan's trace, and its band on the same samples when run. */
  trace: ChartTrace;
  band?: ChartBand | null;
  /** A what-if's trace (dashed), if any, and its band once ready. */
  whatIf?: ChartTrace | null;
  whatIfBand?: ChartBand | null;
  unitSystem: UnitSystem;
  hoverDistanceM: number | null;
  onHoverDistance?: (distanceM: number | null) => void;
  height?: number;
}

const LINE_COLOURS = ["#16232a", "#1f5a4f", "#7a4b9b"];

/** @private The tooltip: each position's temperature with its band ("about 240 °C (210–290)"). */
function ChartTooltip({ active, payload, positions, ceilingsC, system }: { active?: boolean; payload?: readonly { payload?: ChartRow }[]; positions: string[]; ceilingsC: number[]; system: UnitSystem }) {
  const row = payload?.[0]?.payload;
  if (!active || !row) return null;
  const text = (prefix: "" | "w", k: number) => {
    const c = row[`${prefix}c${k}`];
    if (typeof c !== "number") return null;
    const e = row[`${prefix}e${k}`];
    const band = Array.isArray(e) ? { lowC: e[0], highC: e[1] } : null;
    return formatTemperatureBand(c, band, ceilingsC[k] ?? Infinity, system);
  };
  return (
    <div className="rounded-md border border-line bg-surface px-3 py-2 text-xs shadow-sm" data-testid="heat-chart-tooltip">
      <p className="mb-1 font-semibold">{row.x.toFixed(1)} {distanceUnit(system)}</p>
      {positions.map((p, k) => {
        const plan = text("", k);
        const whatIf = text("w", k);
        return (
          <p key={p} className="tabular-nums">
            <span style={{ color: LINE_COLOURS[k] ?? "#555" }}>{p}</span>: {plan}
            {whatIf !== null && <span className="text-ink-muted">; what-if {whatIf}</span>}
          </p>
        );
      })}
    </div>
  );
}

/** The temperature chart. Renders a `data-testid="heat-chart"` figure; `data-band` says which band is drawn. */
export const HeatChart = memo(function HeatChart({ positions, warmC, hotC, ceilingsC, trace, band, whatIf, whatIfBand, unitSystem, hoverDistanceM, onHoverDistance, height = 220 }: HeatChartProps) {
  const data = useMemo(() => chartRows(trace, band, whatIf, whatIfBand, ceilingsC, unitSystem), [trace, band, whatIf, whatIfBand, ceilingsC, unitSystem]);
  const axis = useMemo(() => yAxis(data, ceilingsC, unitSystem), [data, ceilingsC, unitSystem]);
  const unit = unitSystem === "metric" ? "°C" : "°F";
  const xMax = data.length ? (data[data.length - 1]!.x as number) : 0;
  // With a what-if on screen, its band is the one that matters; the plan's steps back.
  const shown: "plan" | "what-if" | "none" = whatIf ? (whatIfBand ? "what-if" : "none") : band ? "plan" : "none";
  return (
    <figure data-testid="heat-chart" data-band={shown} aria-label={`Brake temperature along the route in ${unit}, per brake position, with its likely range`} className="m-0">
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart
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
          <YAxis width={58} fontSize={11} unit={` ${unit}`} allowDecimals={false} domain={axis.domain} ticks={axis.ticks} allowDataOverflow />
          <Tooltip content={<ChartTooltip positions={positions} ceilingsC={ceilingsC} system={unitSystem} />} />
          {shown !== "none" &&
            positions.map((p, k) => (
              <Area
                key={`band-${k}`}
                dataKey={shown === "plan" ? `b${k}` : `wb${k}`}
                type="linear"
                stroke="none"
                fill={LINE_COLOURS[k] ?? "#555"}
                fillOpacity={0.14}
                isAnimationActive={false}
                activeDot={false}
                className="heat-band"
              />
            ))}
          <ReferenceLine y={Math.round(toUserT(warmC, unitSystem))} stroke={HEAT_COLOURS.warm} strokeDasharray="4 3" label={{ value: "caution", position: "insideTopLeft", fontSize: 10, fill: "#8a5d00" }} />
          <ReferenceLine y={Math.round(toUserT(hotC, unitSystem))} stroke={HEAT_COLOURS.hot} strokeDasharray="4 3" label={{ value: "fade likely", position: "insideTopLeft", fontSize: 10, fill: "#9a3a10" }} />
          <ReferenceLine y={axis.lowestCeiling} stroke={HEAT_COLOURS.runaway} strokeDasharray="2 3" label={{ value: "Fadeline's range ends", position: "insideBottomRight", fontSize: 10, fill: HEAT_COLOURS.runaway }} />
          {positions.map((p, k) => (
            <Line key={`p${k}`} dataKey={`p${k}`} name={`p${k}`} type="linear" dot={false} isAnimationActive={false} stroke={LINE_COLOURS[k] ?? "#555"} strokeWidth={1.6} />
          ))}
          {whatIf &&
            positions.map((p, k) => (
              <Line key={`w${k}`} dataKey={`w${k}`} name={`w${k}`} type="linear" dot={false} isAnimationActive={false} stroke={LINE_COLOURS[k] ?? "#555"} strokeWidth={1.6} strokeDasharray="5 3" opacity={0.85} />
            ))}
          {hoverDistanceM !== null && <ReferenceLine x={hoverDistanceM / (unitSystem === "metric" ? 1000 : 1609.344)} stroke="#16232a" />}
        </ComposedChart>
      </ResponsiveContainer>
      <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        {positions.map((p, k) => (
          <span key={p} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-0.5 w-5" style={{ background: LINE_COLOURS[k] ?? "#555" }} />
            {p}
          </span>
        ))}
        {whatIf && <span>Dashed: the what-if{whatIfBand ? "" : " (its likely range is being worked out)"}</span>}
        {shown !== "none" && <span>Shaded: the likely range{shown === "what-if" ? " of the what-if" : ""} (10th–90th percentile)</span>}
        <span>Bulk rotor and drum temperatures, estimates; above the ceiling line Fadeline cannot give a temperature.</span>
      </figcaption>
    </figure>
  );
});
