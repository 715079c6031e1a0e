import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db";
import { PageHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/permissions";
import { listAuditEventsByOrganisation } from "@/lib/server/audit";
import { requireWorkContext } from "@/lib/server/work-context";
import { AuditTable } from "./audit-table";

export const metadata: Metadata = { title: "Audit list" };

export default async function AuditPage() {
  const { active } = await requireWorkContext("/organisation/audit");
  if (!can(active.role, "audit.read")) {
    return (
      <>
        <PageHeader title="Audit list" />
        <Notice tone="caution" title="Owners only">
          Only the owners of {active.name} can read its audit list. <Link href="/organisation" className="underline">Back to the organisation</Link>.
        </Notice>
      </>
    );
  }
  const events = await listAuditEventsByOrganisation(getDb(), { organisationId: active.id });
  return (
    <>
      <PageHeader title="Audit list" description={`Who changed what in ${active.name}, newest first. Entries are never edited.`} />
      <AuditTable events={events} />
    </>
  );
}
