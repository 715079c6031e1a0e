import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db";
import { PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/permissions";
import { listRigs } from "@/lib/server/rigs/rigs-dal";
import { listRoutes } from "@/lib/server/routes/routes-dal";
import { requireWorkContext } from "@/lib/server/work-context";
import { planToForm } from "@/lib/plan-form";
import { PlanForm } from "../_components/plan-form";

export const metadata: Metadata = { title: "New plan" };

export default async function NewPlanPage() {
  const { user, active } = await requireWorkContext("/plans/new");
  if (!can(active.role, "content.create")) {
    return <Notice tone="caution" title="Planners and owners make plans">Your role in {active.name} lets you read plans, not create them.</Notice>;
  }
  const db = getDb();
  const [routes, rigs] = await Promise.all([listRoutes(db, user, active.id), listRigs(db, user, active.id)]);
  return (
    <>
      <PageHeader title="New plan" description="Choose the route, the rigs of the convoy and the conditions of the trip." />
      {routes.length === 0 || rigs.length === 0 ? (
        <EmptyState title="A plan needs a route and a rig">
          {routes.length === 0 && <p>Upload the trip&apos;s GPX on <Link href="/routes" className="underline">Routes</Link>.</p>}
          {rigs.length === 0 && <p>Describe at least one rig on <Link href="/rigs" className="underline">Rigs</Link>.</p>}
        </EmptyState>
      ) : (
        <PlanForm
          organisationId={active.id}
          initial={planToForm({}, user.unitSystem)}
          routes={routes.map((r) => ({ id: r.id, name: r.name }))}
          rigs={rigs.map((r) => ({ id: r.id, name: r.name }))}
          unitSystem={user.unitSystem}
        />
      )}
    </>
  );
}
