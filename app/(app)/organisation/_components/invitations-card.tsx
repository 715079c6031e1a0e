"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery } from "@tanstack/react-query";
import type { ColumnDef } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";
import { api, applyFieldErrors } from "@/lib/client/api";
import type { InvitationRow, InvitationStatus } from "@/lib/server/invitations";
import { invitationInputSchema } from "@/lib/validation/organisation";
import { invitationKey, useRefreshOrganisation } from "./use-org-queries";

type Invitation = Omit<InvitationRow, "createdAt" | "expiresAt"> & { createdAt: string | Date; expiresAt: string | Date };
type Values = z.input<typeof invitationInputSchema>;

const STATUS_TONE: Record<InvitationStatus, "pine" | "neutral" | "notice" | "danger"> = {
  pending: "notice",
  accepted: "pine",
  revoked: "neutral",
  expired: "neutral",
};
const STATUS_LABEL: Record<InvitationStatus, string> = { pending: "Waiting", accepted: "Accepted", revoked: "Withdrawn", expired: "Expired" };

export function InvitationsCard({ organisationId, initialInvitations }: { organisationId: string; initialInvitations: Invitation[] }) {
  const refresh = useRefreshOrganisation(organisationId);
  const [manualLink, setManualLink] = useState<string | null>(null);
  const list = useQuery({
    queryKey: invitationKey(organisationId),
    queryFn: () => api<{ invitations: Invitation[] }>(`/api/organisations/${organisationId}/invitations`).then((r) => r.invitations),
    initialData: initialInvitations,
  });
  const form = useForm<Values>({ resolver: zodResolver(invitationInputSchema), defaultValues: { email: "", role: "planner" } });
  const invite = useMutation({
    mutationFn: (values: Values) =>
      api<{ link: string; mailSent: boolean; invitation: Invitation }>(`/api/organisations/${organisationId}/invitations`, { body: values }),
    onSuccess: (result) => {
      form.reset({ email: "", role: form.getValues("role") });
      setManualLink(result.mailSent ? null : result.link);
      if (result.mailSent) toast.success(`Invitation sent to ${result.invitation.email}.`);
      else toast.warning("The invitation is saved, but the e-mail could not be sent. Pass the link on yourself.");
      refresh();
    },
    onError: (error) => {
      if (!applyFieldErrors(error, form.setError)) toast.error(error.message);
    },
  });
  const revoke = useMutation({
    mutationFn: (id: string) => api(`/api/organisations/${organisationId}/invitations/${id}`, { method: "DELETE" }),
    onSuccess: () => {
      toast.success("Invitation withdrawn; its link no longer works.");
      refresh();
    },
    onError: (e) => toast.error(e.message),
  });
  const columns = useMemo<ColumnDef<Invitation, unknown>[]>(
    () => [
      { accessorKey: "email", header: "E-mail" },
      { accessorKey: "role", header: "Role", cell: ({ row }) => ROLE_LABELS[row.original.role] },
      { accessorKey: "status", header: "Status", cell: ({ row }) => <Badge tone={STATUS_TONE[row.original.status]}>{STATUS_LABEL[row.original.status]}</Badge> },
      { accessorKey: "createdAt", header: "Sent", sortingFn: "datetime", cell: ({ getValue }) => new Date(getValue() as string).toLocaleDateString() },
      { accessorKey: "expiresAt", header: "Link expires", sortingFn: "datetime", cell: ({ getValue }) => new Date(getValue() as string).toLocaleDateString() },
      { accessorKey: "invitedByName", header: "Invited by", cell: ({ getValue }) => (getValue() as string | null) ?? "—" },
      {
        id: "actions",
        enableSorting: false,
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) =>
          row.original.status === "pending" ? (
            <Button size="sm" variant="ghost" busy={revoke.isPending && revoke.variables === row.original.id} onClick={() => revoke.mutate(row.original.id)}>
              Withdraw
            </Button>
          ) : null,
      },
    ],
    [revoke],
  );
  const { errors } = form.formState;
  return (
    <Card>
      <CardHeader title="Invitations" description="Invite people by e-mail. Each link works once and expires after 7 days." />
      <div className="space-y-5 p-5">
        <form onSubmit={form.handleSubmit((v) => invite.mutate(v))} noValidate className="flex flex-wrap items-start gap-3">
          <Field label="E-mail" error={errors.email?.message} className="min-w-64 flex-1">
            {(ids) => <input {...ids} type="email" placeholder="name@example.com" className={`${controlClasses(!!errors.email)} h-10`} {...form.register("email")} />}
          </Field>
          <Field label="Role" error={errors.role?.message}>
            {(ids) => (
              <select {...ids} className={`${controlClasses(!!errors.role)} h-10`} {...form.register("role")}>
                {ROLES.map((r) => (
                  <option key={r} value={r}>{ROLE_LABELS[r]}</option>
                ))}
              </select>
            )}
          </Field>
          <Button type="submit" busy={invite.isPending} className="mt-6">Send invitation</Button>
        </form>
        {manualLink && (
          <Notice tone="caution" title="Pass this link on yourself">
            <code className="break-all text-xs">{manualLink}</code>
          </Notice>
        )}
        <DataTable
          columns={columns}
          data={list.data}
          searchLabel="Search invitations"
          getRowId={(i) => i.id}
          empty={<EmptyState title="No invitations yet">Invite a planner to build plans with you, or a viewer who only reads them.</EmptyState>}
        />
      </div>
    </Card>
  );
}
