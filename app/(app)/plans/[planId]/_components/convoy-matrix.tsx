"use client";

import { worstCell, type RunOutcome } from "@/lib/advice";
import type { Descent } from "@/lib/route";
import { formatDistance, formatElevation, formatGrade, formatTemperature, type UnitSystem } from "@/lib/units";
import { CLASS_LABELS, HEAT_COLOURS } from "@/components/plan-view/heat-colours";
import type { PlanViewMember } from "./plan-view";

const peakOf = (o: RunOutcome) => Math.max(...o.positions.map((p) => p.peakC));

function Cell({ outcome, withAdvice, units, worst }: { outcome: RunOutcome; withAdvice: RunOutcome; units: UnitSystem; worst: boolean }) {
  const changed = withAdvice.worstClass !== outcome.worstClass || Math.abs(peakOf(withAdvice) - peakOf(outcome)) >= 1;
  return (
    <td className={`px-3 py-2 align-top ${worst ? "bg-sunken" : ""}`} data-class={outcome.worstClass}>
      <span className="flex items-center gap-1.5 font-semibold tabular-nums">
        <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: HEAT_COLOURS[outcome.worstClass] }} />
        {formatTemperature(peakOf(outcome), units)}
      </span>
      <span className="block text-xs text-ink-soft">{CLASS_LABELS[outcome.worstClass]}</span>
      {changed && (
        <span className="mt-0.5 block text-xs text-ink-muted">
          with advice: {formatTemperature(peakOf(withAdvice), units)}, {CLASS_LABELS[withAdvice.worstClass].toLowerCase()}
        </span>
      )}
      {worst && <span className="mt-0.5 block text-xs font-medium text-ink">worst rig here</span>}
    </td>
  );
}

/** Descents × rigs: each rig's peak brake temperature and class on each descent as planned, and with its advice. */
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
            const cells = members.map((m, rigIndex) => ({ rigIndex, label: m.label, asPlanned: m.result.advice.proof[i]!.asPlanned, withAdvice: m.result.advice.proof[i]!.withAdvice }));
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
                  <Cell key={c.rigIndex} outcome={c.asPlanned} withAdvice={c.withAdvice} units={units} worst={c.rigIndex === worst} />
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
