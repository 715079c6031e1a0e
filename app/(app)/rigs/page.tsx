import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db";
import { buttonClasses } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { rigMasses } from "@/lib/thermal";
import { listRigs } from "@/lib/server/rigs/rigs-dal";
import { requireWorkContext } from "@/lib/server/work-context";
import { complianceStatus } from "./_components/compliance-report";
import { RigsTable } from "./_components/rigs-table";

export const metadata: Metadata = { title: "Rigs" };

export default async function RigsPage() {
  const { user, active } = await requireWorkContext("/rigs");
  const rigs = await listRigs(getDb(), user, active.id);
  const canWrite = can(active.role, "content.create");
  const rows = rigs.map((r) => ({
    id: r.id,
    name: r.name,
    vehicle: r.rig.vehicle.name,
    trailer: r.rig.trailer?.name ?? null,
    combinationKg: rigMasses(r.rig).combinationKg,
    status: complianceStatus(r.compliance),
    region: r.region,
    updatedAt: r.updatedAt.toISOString(),
  }));
  return (
    <>
      <PageHeader
        title="Rigs"
        description={`A rig is a tow vehicle, an optional trailer or caravan, and the load. ${active.name}'s rigs are checked against their ratings and used in plans.`}
        actions={canWrite && <Link href="/rigs/new" className={buttonClasses("primary") + " no-underline"}>New rig</Link>}
      />
      <RigsTable rows={rows} canWrite={canWrite} unitSystem={user.unitSystem} />
    </>
  );
}
