"use client";

import { useMutation, useQuery } from "@tanstack/react-query";
import type { ColumnDef } from "@tanstack/react-table";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { toast } from "sonner";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { DataTable } from "@/components/ui/data-table";
import { can, ROLE_LABELS, ROLES, type Role } from "@/lib/auth/permissions";
import { api } from "@/lib/client/api";
import type { MemberRow } from "@/lib/server/members";
import { memberKey, useRefreshOrganisation } from "./use-org-queries";

type Member = Omit<MemberRow, "joinedAt"> & { joinedAt: string | Date };

export function MembersCard({
  organisationId,
  role,
  currentUserId,
  initialMembers,
}: {
  organisationId: string;
  role: Role;
  currentUserId: string;
  initialMembers: Member[];
}) {
  const router = useRouter();
  const refresh = useRefreshOrganisation(organisationId);
  const members = useQuery({
    queryKey: memberKey(organisationId),
    queryFn: () => api<{ members: Member[] }>(`/api/organisations/${organisationId}/members`).then((r) => r.members),
    initialData: initialMembers,
  });
  const changeRole = useMutation({
    mutationFn: (v: { userId: string; role: Role }) =>
      api(`/api/organisations/${organisationId}/members/${v.userId}`, { method: "PATCH", body: { role: v.role } }),
    onSuccess: (_d, v) => {
      toast.success(`Role changed to ${ROLE_LABELS[v.role].toLowerCase()}.`);
      refresh();
      if (v.userId === currentUserId) router.refresh();
    },
    onError: (e) => toast.error(e.message),
  });
  const remove = useMutation({
    mutationFn: (userId: string) => api(`/api/organisations/${organisationId}/members/${userId}`, { method: "DELETE" }),
    onSuccess: () => {
      toast.success("Member removed.");
      refresh();
    },
    onError: (e) => toast.error(e.message),
  });
  const owner = can(role, "member.change_role");
  const columns = useMemo<ColumnDef<Member, unknown>[]>(
    () => [
      {
        accessorKey: "name",
        header: "Name",
        cell: ({ row }) => (
          <span className="font-medium">
            {row.original.name} {row.original.userId === currentUserId && <Badge>you</Badge>}
          </span>
        ),
      },
      { accessorKey: "email", header: "E-mail" },
      {
        accessorKey: "role",
        header: "Role",
        cell: ({ row }) =>
          owner ? (
            <select
              aria-label={`Role of ${row.original.name}`}
              value={row.original.role}
              disabled={changeRole.isPending}
              onChange={(e) => changeRole.mutate({ userId: row.original.userId, role: e.target.value as Role })}
              className="h-8 rounded-md border border-line-strong bg-surface px-2 text-sm"
            >
              {ROLES.map((r) => (
                <option key={r} value={r}>{ROLE_LABELS[r]}</option>
              ))}
            </select>
          ) : (
            <Badge tone={row.original.role === "owner" ? "pine" : "neutral"}>{ROLE_LABELS[row.original.role]}</Badge>
          ),
      },
      {
        accessorKey: "joinedAt",
        header: "Joined",
        cell: ({ getValue }) => new Date(getValue() as string).toLocaleDateString(),
        sortingFn: "datetime",
      },
      {
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) =>
          owner && row.original.userId !== currentUserId ? (
            <RemoveButton name={row.original.name} busy={remove.isPending} onConfirm={() => remove.mutate(row.original.userId)} />
          ) : null,
      },
    ],
    [owner, currentUserId, changeRole, remove],
  );
  return (
    <Card>
      <CardHeader title="Members" description={`${members.data.length} ${members.data.length === 1 ? "person" : "people"}`} />
      <div className="p-5">
        {members.isError && <p className="mb-3 text-sm text-danger-600">Could not refresh the list: {members.error.message}</p>}
        <DataTable columns={columns} data={members.data} searchLabel="Search members" getRowId={(m) => m.userId} initialSort={[{ id: "name", desc: false }]} />
      </div>
    </Card>
  );
}

function RemoveButton({ name, busy, onConfirm }: { name: string; busy: boolean; onConfirm: () => void }) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return <Button size="sm" variant="ghost" onClick={() => setAsking(true)}>Remove</Button>;
  }
  return (
    <span className="inline-flex items-center gap-2">
      <span className="text-xs text-ink-soft">Remove {name}?</span>
      <Button size="sm" variant="danger" busy={busy} onClick={onConfirm}>Remove</Button>
      <Button size="sm" variant="ghost" onClick={() => setAsking(false)}>Cancel</Button>
    </span>
  );
}
