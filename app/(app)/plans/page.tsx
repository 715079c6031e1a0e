import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db";
import { SafetyCaution } from "@/components/safety-caution";
import { buttonClasses } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { listPlans } from "@/lib/server/plans/plans-dal";
import { requireWorkContext } from "@/lib/server/work-context";
import { PlansTable } from "./_components/plans-table";

export const metadata: Metadata = { title: "Plans" };

export default async function PlansPage() {
  const { user, active } = await requireWorkContext("/plans");
  const plans = await listPlans(getDb(), user, active.id);
  const canWrite = can(active.role, "content.create");
  return (
    <>
      <PageHeader
        title="Plans"
        description="A plan puts a route together with the rigs of a convoy and shows, descent by descent, where each rig's brakes will run hot and what to do about it."
        actions={canWrite && <Link href="/plans/new" className={buttonClasses("primary") + " no-underline"}>New plan</Link>}
      />
      <PlansTable plans={plans} canWrite={canWrite} unitSystem={user.unitSystem} />
      <SafetyCaution className="mt-6" />
    </>
  );
}
