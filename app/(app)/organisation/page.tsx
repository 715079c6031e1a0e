import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db";
import { buttonClasses } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { listInvitations } from "@/lib/server/invitations";
import { listMembers } from "@/lib/server/members";
import { requireWorkContext } from "@/lib/server/work-context";
import { CreateOrganisationCard } from "./_components/create-organisation-card";
import { DetailsCard } from "./_components/details-card";
import { InvitationsCard } from "./_components/invitations-card";
import { LeaveCard } from "./_components/leave-card";
import { MembersCard } from "./_components/members-card";

export const metadata: Metadata = { title: "Organisation" };

export default async function OrganisationPage() {
  const { user, active } = await requireWorkContext("/organisation");
  const db = getDb();
  const members = await listMembers(db, user, active.id);
  const invitations = can(active.role, "invitation.read") ? await listInvitations(db, user, active.id) : [];
  return (
    <>
      <PageHeader
        title={active.name}
        description={
          active.kind === "personal"
            ? "Your own organisation. Invite a travelling partner to plan with you, or create a team organisation for a tour business."
            : "Everyone who plans or reads this organisation's routes, rigs and plans."
        }
        actions={
          can(active.role, "audit.read") && (
            <Link href="/organisation/audit" className={buttonClasses("secondary") + " no-underline"}>
              Audit list
            </Link>
          )
        }
      />
      <div className="grid gap-6">
        <DetailsCard organisation={active} />
        <MembersCard organisationId={active.id} role={active.role} currentUserId={user.userId} initialMembers={members} />
        {can(active.role, "invitation.read") && <InvitationsCard organisationId={active.id} initialInvitations={invitations} />}
        <div className="grid gap-6 md:grid-cols-2">
          <LeaveCard organisationId={active.id} organisationName={active.name} userId={user.userId} />
          <CreateOrganisationCard />
        </div>
      </div>
    </>
  );
}
