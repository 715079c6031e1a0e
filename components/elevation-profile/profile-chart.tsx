"use client";

/**
 * The static part of the elevation profile (recharts): the grade-coloured area and line, descent shading and
 * gap marks. It is memoised and knows nothing of the hover, so moving the cursor never re-renders 1,500 points;
 * the cursor is an HTML overlay placed with the plot area this chart reports.
 */
import { memo, useEffect, useId } from "react";
import { Area, AreaChart, CartesianGrid, ReferenceArea, ReferenceLine, ResponsiveContainer, usePlotArea, XAxis, YAxis } from "recharts";
import { ROUTE_INK } from "@/components/route-map/grade-colours";
import type { ChartPoint, GradientStop } from "./profile-data";

/** The plot area inside the chart's SVG, px. */
export interface PlotBox {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A shaded range in display units, labelled with its number. */
export interface ShadedRange {
  from: number;
  to: number;
  number: number;
}

/** Props of {@link ProfileChart}; x in km or mi, y in m or ft. */
export interface ProfileChartProps {
  points: ChartPoint[];
  xMax: number;
  xTicks: number[];
  yDomain: [number, number];
  yTicks: number[];
  stops: GradientStop[];
  descents: ShadedRange[];
  /** Distances of gaps between track segments. */
  gaps: number[];
  height: number;
  onPlot: (plot: PlotBox) => void;
}

const AXIS_TICK = { fontSize: 11, fill: "#5e6e74" };
const tickNumber = (v: number) => v.toLocaleString("en", { maximumFractionDigits: 1 });

/** The horizontal gradient, in the SVG's own pixels so the line and the area share it exactly. */
function GradeGradient({ id, stops }: { id: string; stops: GradientStop[] }) {
  const plot = usePlotArea();
  if (!plot) return null;
  return (
    <defs>
      <linearGradient id={id} gradientUnits="userSpaceOnUse" x1={plot.x} x2={plot.x + plot.width} y1={0} y2={0}>
        {stops.map((s, i) => (
          <stop key={i} offset={s.offset} stopColor={s.colour} />
        ))}
      </linearGradient>
    </defs>
  );
}

/** Tells the parent where the plot area is, whenever it changes (e.g. on resize). */
function PlotReporter({ onPlot }: { onPlot: (plot: PlotBox) => void }) {
  const plot = usePlotArea();
  const { x, y, width, height } = plot ?? { x: 0, y: 0, width: 0, height: 0 };
  useEffect(() => {
    if (width > 0) onPlot({ x, y, width, height });
  }, [x, y, width, height, onPlot]);
  return null;
}

/** "↓ Descent 2" where there is room, "↓2" in a narrow band, nothing in a sliver. */
function DescentLabel({ viewBox, number }: { viewBox?: { x?: number; y?: number; width?: number }; number: number }) {
  const x = viewBox?.x ?? 0;
  const width = viewBox?.width ?? 0;
  const text = width >= 76 ? `↓ Descent ${number}` : width >= 18 ? `↓${number}` : "";
  if (!text) return null;
  return (
    <text x={x + width / 2} y={(viewBox?.y ?? 0) + 13} textAnchor="middle" fontSize={11} fontWeight={600} fill={ROUTE_INK.descent}>
      {text}
    </text>
  );
}

function Chart({ points, xMax, xTicks, yDomain, yTicks, stops, descents, gaps, height, onPlot }: ProfileChartProps) {
  const gradientId = `grade-${useId().replace(/:/g, "")}`;
  const paint = stops.length > 0 ? `url(#${gradientId})` : ROUTE_INK.casing;
  return (
    <ResponsiveContainer width="100%" height={height} initialDimension={{ width: 320, height }}>
      <AreaChart data={points} margin={{ top: 6, right: 12, bottom: 0, left: 0 }} accessibilityLayer={false}>
        <GradeGradient id={gradientId} stops={stops} />
        <PlotReporter onPlot={onPlot} />
        <CartesianGrid vertical={false} stroke="#dcd7cb" strokeDasharray="2 3" />
        {descents.map((d) => (
          <ReferenceArea
            key={d.number}
            x1={d.from}
            x2={d.to}
            fill={ROUTE_INK.descent}
            fillOpacity={0.09}
            zIndex={50}
            ifOverflow="hidden"
            label={<DescentLabel number={d.number} />}
          />
        ))}
        {gaps.map((g) => (
          <ReferenceLine key={g} x={g} stroke="#5e6e74" strokeDasharray="3 3" label={{ value: "gap", position: "insideBottomRight", fontSize: 10, fill: "#5e6e74" }} />
        ))}
        <XAxis type="number" dataKey="x" domain={[0, xMax]} ticks={xTicks} allowDataOverflow tick={AXIS_TICK} tickFormatter={tickNumber} tickLine={false} stroke="#bfb8a8" />
        <YAxis type="number" domain={yDomain} ticks={yTicks} allowDataOverflow width={46} tick={AXIS_TICK} tickFormatter={tickNumber} tickLine={false} axisLine={false} />
        <Area
          dataKey="y"
          type="linear"
          baseValue={yDomain[0]}
          stroke={paint}
          strokeWidth={2.5}
          fill={paint}
          fillOpacity={0.55}
          dot={false}
          activeDot={false}
          isAnimationActive={false}
        />
      </AreaChart>
    </ResponsiveContainer>
  );
}

/** The memoised static chart. */
export const ProfileChart = memo(Chart);
