"use client";

import { worstCell, type BandEdges, type RunOutcome } from "@/lib/advice";
import type { Descent } from "@/lib/route";
import { formatDistance, formatElevation, formatGrade, type UnitSystem } from "@/lib/units";
import { CLASS_LABELS, HEAT_COLOURS } from "@/components/plan-view/heat-colours";
import { peakWithBand, worstPosition } from "@/components/plan-view/heat-text";
import type { PlanViewMember } from "./plan-view";

/** @private The run's figure for a cell: its worst brake's peak, "about 240 °C (210–290)" with the band. */
function peakFigure(o: RunOutcome, band: readonly BandEdges[] | undefined, units: UnitSystem): string {
  const j = worstPosition(o.positions);
  const p = o.positions[j];
  return p ? peakWithBand(p.peakC, p.ceilingC, band?.[j], units) : "";
}

function Cell({ outcome, withAdvice, band, units, worst }: { outcome: RunOutcome; withAdvice: RunOutcome; band?: { asPlanned: BandEdges[]; withAdvice: BandEdges[] }; units: UnitSystem; worst: boolean }) {
  const planned = peakFigure(outcome, band?.asPlanned, units);
  const advised = peakFigure(withAdvice, band?.withAdvice, units);
  const changed = withAdvice.worstClass !== outcome.worstClass || advised !== planned;
  return (
    <td className={`px-3 py-2 align-top ${worst ? "bg-sunken" : ""}`} data-class={outcome.worstClass} data-testid="matrix-cell">
      <span className="flex items-center gap-1.5 font-semibold tabular-nums">
        <span aria-hidden="true" className="inline-block h-2.5 w-2.5 shrink-0 rounded-full" style={{ background: HEAT_COLOURS[outcome.worstClass] }} />
        {planned}
      </span>
      <span className="block text-xs text-ink-soft">{CLASS_LABELS[outcome.worstClass]}</span>
      {changed && (
        <span className="mt-0.5 block text-xs text-ink-muted" data-testid="matrix-with-advice" data-class={withAdvice.worstClass}>
          with advice: {advised}, {CLASS_LABELS[withAdvice.worstClass].toLowerCase()}
        </span>
      )}
      {worst && <span className="mt-0.5 block text-xs font-medium text-ink">worst rig here</span>}
    </td>
  );
}

/**
 * Descents × rigs: each rig's peak brake temperature (with its band, "about 240 °C (210–290)") and class on
 * each descent as planned, and with its advice. A peak at or past the brake's validity ceiling reads "beyond
 * Fadeline's range" (docs/model.md, "Validity ceiling").
 */
export function ConvoyMatrix({ descents, members, units }: { descents: readonly Descent[]; members: readonly PlanViewMember[]; units: UnitSystem }) {
  if (descents.length === 0) return <p className="p-5 text-sm text-ink-muted">This route has no descents long or steep enough to heat the brakes.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[36rem] text-sm" data-testid="convoy-matrix">
        <caption className="sr-only">Peak brake temperature of each rig on each descent, as planned and with advice</caption>
        <thead>
          <tr className="border-b border-line text-left text-xs text-ink-muted">
            <th scope="col" className="px-3 py-2 font-medium">Descent</th>
            {members.map((m) => (
              <th key={m.planRigId} scope="col" className="px-3 py-2 font-medium">
                <span className="block text-ink">{m.label}</span>
                {m.rigName}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {descents.map((d, i) => {
            const cells = members.map((m, rigIndex) => ({ rigIndex, label: m.label, asPlanned: m.result.advice.proof[i]!.asPlanned, withAdvice: m.result.advice.proof[i]!.withAdvice, band: m.result.advice.proof[i]!.band }));
            const worst = members.length > 1 ? worstCell(cells) : -1;
            return (
              <tr key={i} className="border-b border-line last:border-0">
                <th scope="row" className="px-3 py-2 text-left align-top font-normal">
                  <span className="font-semibold">↓{i + 1}</span> {formatDistance(d.startDistanceM, units)} – {formatDistance(d.endDistanceM, units)}
                  <span className="block text-xs text-ink-muted">
                    {formatElevation(d.dropM, units)} down, {formatGrade(d.meanGrade)} mean
                  </span>
                </th>
                {cells.map((c) => (
                  <Cell key={c.rigIndex} outcome={c.asPlanned} withAdvice={c.withAdvice} band={c.band} units={units} worst={c.rigIndex === worst} />
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
