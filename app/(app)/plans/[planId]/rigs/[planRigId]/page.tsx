import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardHeader, PageHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { GENERAL_CAUTIONS } from "@/lib/advice";
import { can } from "@/lib/auth/permissions";
import { formatDistance } from "@/lib/units";
import { peakWithBand } from "@/components/plan-view/heat-text";
import { AdviceList } from "../../_components/advice-list";
import { BrakeComparison } from "../../_components/brake-comparison";
import { positionLabel, trailerNoun, VERDICT_TEXT } from "../../_components/words";
import { loadPlan } from "../../load-plan";

export const metadata: Metadata = { title: "Rig in a plan" };

const minutes = (s: number) => (s < 30 ? "—" : `${Math.round(s / 60)} min`);

export default async function PlanRigPage({ params }: { params: Promise<{ planId: string; planRigId: string }> }) {
  const { planId, planRigId } = await params;
  const { user, plan, runs, route } = await loadPlan(planId, `/plans/${planId}/rigs/${planRigId}`);
  const run = runs.find((r) => r.planRigId === planRigId);
  if (!run) notFound();
  const units = user.unitSystem;
  const back = (
    <Link href={`/plans/${plan.id}`} className={buttonClasses("ghost") + " no-underline"}>Back to the plan</Link>
  );
  if (!run.result) {
    return (
      <>
        <PageHeader title={`${run.label}: ${run.rigName}`} actions={back} />
        <Notice tone="caution" title="Not worked out yet">This rig&apos;s results are out of date or missing. Open the plan to work them out.</Notice>
      </>
    );
  }
  const { analysis, advice } = run.result;
  const noun = trailerNoun(run.rig);
  return (
    <>
      <PageHeader
        title={`${run.label}: ${run.rigName}`}
        description={<>In <Link href={`/plans/${plan.id}`}>{plan.name}</Link> on {route.name}. Verdict for this rig: {VERDICT_TEXT[advice.verdict].title.toLowerCase()}.</>}
        actions={
          <div className="flex gap-2">
            {back}
            <Link href={`/rigs/${run.rigId}`} className={buttonClasses("secondary") + " no-underline"}>The rig and its ratings</Link>
          </div>
        }
      />
      <div className="grid gap-6">
        <Card>
          <CardHeader title="Descents, as planned and with advice" description="Peak bulk temperature per brake position, and the driving time at or above the caution line." />
          <div className="overflow-x-auto p-2">
            <table className="w-full min-w-[40rem] text-sm" data-testid="rig-descents">
              <thead>
                <tr className="border-b border-line text-left text-xs text-ink-muted">
                  <th className="px-3 py-2 font-medium">Descent</th>
                  {analysis.positions.map((p) => (
                    <th key={p.position} className="px-3 py-2 font-medium">{positionLabel(p.position, run.rig)}</th>
                  ))}
                  <th className="px-3 py-2 font-medium">Time at or above caution</th>
                </tr>
              </thead>
              <tbody>
                {advice.proof.map((row) => {
                  const d = route.descents[row.descentIndex]!;
                  return (
                    <tr key={row.descentIndex} className="border-b border-line align-top last:border-0">
                      <td className="px-3 py-2">↓{row.descentIndex + 1} {formatDistance(d.startDistanceM, units)} – {formatDistance(d.endDistanceM, units)}</td>
                      {row.asPlanned.positions.map((p, k) => (
                        <td key={p.position} className="px-3 py-2 tabular-nums">
                          {peakWithBand(p.peakC, p.ceilingC, row.band?.asPlanned[k], units)}
                          <span className="block text-xs text-ink-muted">with advice {peakWithBand(row.withAdvice.positions[k]!.peakC, row.withAdvice.positions[k]!.ceilingC, row.band?.withAdvice[k], units)}</span>
                        </td>
                      ))}
                      <td className="px-3 py-2">
                        {minutes(Math.max(...row.asPlanned.positions.map((p) => p.timeWarmOrAboveS)))}
                        <span className="block text-xs text-ink-muted">with advice {minutes(Math.max(...row.withAdvice.positions.map((p) => p.timeWarmOrAboveS)))}</span>
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        </Card>
        <Card>
          <CardHeader title="Advice" description="Each piece re-run through the model; its result is beside it." />
          <div className="p-5">
            <AdviceList advice={advice} unitSystem={units} trailerNoun={noun} />
          </div>
        </Card>
        <Card>
          <CardHeader title="Compare other brakes" description="The same rig with other rotors or drums, pads or fluid, on this route in this plan's conditions. Estimates: have any brake change assessed and fitted by a licensed mechanic." />
          <div className="p-5">
            <BrakeComparison planId={plan.id} organisationId={plan.organisationId} rigName={run.rigName} rig={run.rig} options={run.options} descents={route.descents} unitSystem={units} canEdit={can(plan.role, "content.create")} />
          </div>
        </Card>
        <Notice tone="caution" title="Before you rely on this">
          <ul className="list-disc space-y-1 pl-4">
            {GENERAL_CAUTIONS.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </Notice>
      </div>
    </>
  );
}
