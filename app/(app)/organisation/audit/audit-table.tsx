"use client";

import type { ColumnDef } from "@tanstack/react-table";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import type { AuditRow } from "@/lib/server/audit";

type Row = Omit<AuditRow, "createdAt"> & { createdAt: string | Date };

const ACTION_TEXT: Record<string, string> = {
  "organisation.created": "Created the organisation",
  "organisation.renamed": "Renamed the organisation",
  "member.role_changed": "Changed a member's role",
  "member.removed": "Removed a member",
  "member.left": "Left the organisation",
  "invitation.created": "Sent an invitation",
  "invitation.revoked": "Withdrew an invitation",
  "invitation.accepted": "Accepted an invitation",
  "route.uploaded": "Uploaded a route",
  "route.renamed": "Renamed a route",
  "route.deleted": "Deleted a route",
  "rig.created": "Added a rig",
  "rig.updated": "Changed a rig",
  "rig.deleted": "Deleted a rig",
  "rig.calibrated": "Calibrated a rig from readings",
  "rig.calibration_cleared": "Cleared a rig's calibration",
  "plan.created": "Created a plan",
  "plan.updated": "Changed a plan",
  "plan.deleted": "Deleted a plan",
  "scenario.saved": "Saved a scenario",
};

function describe(detail: Row["detail"]): string {
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${String(v)}`)
    .join(", ");
}

const columns: ColumnDef<Row, unknown>[] = [
  { accessorKey: "createdAt", header: "When", sortingFn: "datetime", cell: ({ getValue }) => new Date(getValue() as string).toLocaleString() },
  { id: "who", accessorFn: (r) => r.actorName ?? "(a removed account)", header: "Who" },
  { id: "what", accessorFn: (r) => ACTION_TEXT[r.action] ?? r.action, header: "What" },
  { id: "record", accessorFn: (r) => `${r.targetType} ${r.targetId.slice(0, 8)}`, header: "Record" },
  { id: "detail", accessorFn: (r) => describe(r.detail), header: "Detail", enableSorting: false },
];

export function AuditTable({ events }: { events: Row[] }) {
  return (
    <DataTable
      columns={columns}
      data={events}
      searchLabel="Search the audit list"
      getRowId={(r) => String(r.id)}
      initialSort={[{ id: "createdAt", desc: true }]}
      empty={<EmptyState title="Nothing recorded yet" />}
    />
  );
}
