import "server-only";
import { desc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { auditEvents, users } from "@/db/schema";

/** Every audited action, as stored in audit_events.action. */
export const AUDIT_ACTIONS = {
  "organisation.created": "created the organisation",
  "organisation.renamed": "renamed the organisation",
  "member.joined": "joined",
  "member.role_changed": "changed a role",
  "member.removed": "removed a member",
  "member.left": "left the organisation",
  "invitation.created": "invited someone",
  "invitation.revoked": "withdrew an invitation",
  "invitation.accepted": "accepted an invitation",
  "route.uploaded": "uploaded a route",
  "route.renamed": "renamed a route",
  "route.deleted": "deleted a route",
  "rig.created": "added a rig",
  "rig.updated": "changed a rig",
  "rig.deleted": "deleted a rig",
  "rig.calibrated": "calibrated a rig from readings",
  "rig.calibration_cleared": "cleared a rig's calibration",
  "plan.created": "created a plan",
  "plan.updated": "changed a plan",
  "plan.deleted": "deleted a plan",
  "scenario.saved": "saved a scenario",
  "scenario.deleted": "deleted a scenario",
} as const;
export type AuditAction = keyof typeof AUDIT_ACTIONS;

export interface AuditInput {
  organisationId: string;
  actorUserId: string | null;
  action: AuditAction;
  targetType: "organisation" | "member" | "invitation" | "route" | "rig" | "plan" | "scenario";
  targetId: string;
  detail?: Record<string, string | number | boolean | null>;
}

/** Writes one audit event; call it inside the transaction of the change it records. */
export async function recordAudit(db: DbOrTx, input: AuditInput): Promise<void> {
  await db.insert(auditEvents).values({ ...input, detail: input.detail ?? {} });
}

export interface AuditRow {
  id: number;
  action: string;
  targetType: string;
  targetId: string;
  detail: Record<string, string | number | boolean | null>;
  createdAt: Date;
  actorName: string | null;
  actorEmail: string | null;
}

/** The newest audit events of an organisation, with who did them. Access is checked by the caller. */
export async function listAuditEventsByOrganisation(
  db: DbOrTx,
  { organisationId, limit = 200 }: { organisationId: string; limit?: number },
): Promise<AuditRow[]> {
  return db
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      targetType: auditEvents.targetType,
      targetId: auditEvents.targetId,
      detail: auditEvents.detail,
      createdAt: auditEvents.createdAt,
      actorName: users.name,
      actorEmail: users.email,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorUserId))
    .where(eq(auditEvents.organisationId, organisationId))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit);
}
