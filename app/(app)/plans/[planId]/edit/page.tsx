import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getDb } from "@/db";
import { PageHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/permissions";
import { AppError } from "@/lib/errors";
import { planToForm } from "@/lib/plan-form";
import { getPlan } from "@/lib/server/plans/plans-dal";
import { listRigs } from "@/lib/server/rigs/rigs-dal";
import { listRoutes } from "@/lib/server/routes/routes-dal";
import { requireWorkContext } from "@/lib/server/work-context";
import { PlanForm } from "../../_components/plan-form";

export const metadata: Metadata = { title: "Edit plan" };

export default async function EditPlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const { planId } = await params;
  const { user } = await requireWorkContext(`/plans/${planId}/edit`);
  const db = getDb();
  let plan;
  try {
    plan = await getPlan(db, user, planId);
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
  if (!can(plan.role, "content.update")) {
    return <Notice tone="caution" title="Planners and owners change plans">Your role lets you read this plan, not change it.</Notice>;
  }
  const [routes, rigs] = await Promise.all([listRoutes(db, user, plan.organisationId), listRigs(db, user, plan.organisationId)]);
  return (
    <>
      <PageHeader title={`Edit ${plan.name}`} description="Results are worked out again for the rigs whose inputs change; rigs that stay keep theirs." />
      <PlanForm
        organisationId={plan.organisationId}
        planId={plan.id}
        initial={planToForm({ ...plan, rigs: plan.convoy.map((c) => ({ rigId: c.rigId, label: c.label })) }, user.unitSystem)}
        routes={routes.map((r) => ({ id: r.id, name: r.name }))}
        rigs={rigs.map((r) => ({ id: r.id, name: r.name }))}
        unitSystem={user.unitSystem}
      />
    </>
  );
}
