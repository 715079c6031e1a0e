import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { planConditionsText } from "@/lib/plan-form";
import { PlanActions } from "./_components/plan-actions";
import { PlanRunner } from "./_components/plan-runner";
import { PlanView, type PlanViewMember } from "./_components/plan-view";
import { loadPlan } from "./load-plan";

export const metadata: Metadata = { title: "Plan" };

export default async function PlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const { planId } = await params;
  const { user, plan, runs, route, scenarios } = await loadPlan(planId, `/plans/${planId}`);
  const units = user.unitSystem;
  const canEdit = can(plan.role, "content.update");
  const stale = runs.filter((r) => r.result === null);
  const members: PlanViewMember[] = runs.flatMap((r) => (r.result ? [{ planRigId: r.planRigId, rigId: r.rigId, label: r.label, rigName: r.rigName, rig: r.rig, options: r.options, result: r.result }] : []));
  return (
    <>
      <PageHeader
        title={plan.name}
        description={
          <>
            On <Link href={`/routes/${route.id}`}>{route.name}</Link>. {planConditionsText(plan, units)}
          </>
        }
        actions={
          canEdit ? <PlanActions planId={plan.id} name={plan.name} /> : <span className="text-sm text-ink-muted">Read only: your role is viewer.</span>
        }
      />
      {plan.notes && <p className="mb-6 max-w-3xl whitespace-pre-line text-sm text-ink-soft" data-testid="plan-notes">{plan.notes}</p>}
      {stale.length > 0 ? (
        <PlanRunner planId={plan.id} pending={stale.map((r) => ({ planRigId: r.planRigId, label: r.label, rigName: r.rigName }))} total={runs.length} />
      ) : (
        <PlanView
          planId={plan.id}
          view={route.view}
          descents={route.descents}
          members={members}
          unitSystem={units}
          canEdit={canEdit}
          scenarios={scenarios.map((s) => ({ id: s.id, name: s.name, settings: s.settings, createdAt: s.createdAt.toISOString(), createdByName: s.createdByName }))}
        />
      )}
    </>
  );
}
