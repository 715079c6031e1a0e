"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import { controlClasses } from "@/components/ui/field";
import { api } from "@/lib/client/api";
import { formatDistance, formatElevation, formatGrade, type UnitSystem } from "@/lib/units";
import { routesKey, type RouteRow } from "./routes-view";

export function RoutesTable({ organisationId, routes, canWrite, unitSystem }: { organisationId: string; routes: RouteRow[]; canWrite: boolean; unitSystem: UnitSystem }) {
  const queryClient = useQueryClient();
  const refresh = () => queryClient.invalidateQueries({ queryKey: routesKey(organisationId) });
  const rename = useMutation({
    mutationFn: (v: { id: string; name: string }) => api(`/api/routes/${v.id}`, { method: "PATCH", body: { name: v.name } }),
    onSuccess: () => {
      toast.success("Route renamed.");
      void refresh();
    },
    onError: (e) => toast.error(e.message),
  });
  const remove = useMutation({
    mutationFn: (id: string) => api(`/api/routes/${id}`, { method: "DELETE" }),
    onSuccess: () => {
      toast.success("Route deleted.");
      void refresh();
    },
    onError: (e) => toast.error(e.message),
  });
  const columns = useMemo<ColumnDef<RouteRow, unknown>[]>(
    () => [
      {
        accessorKey: "name",
        header: "Name",
        cell: ({ row }) => (canWrite ? <NameCell route={row.original} onRename={(name) => rename.mutateAsync({ id: row.original.id, name })} /> : <RouteLink route={row.original} />),
      },
      { accessorKey: "lengthM", header: "Length", cell: ({ getValue }) => formatDistance(getValue() as number, unitSystem) },
      { accessorKey: "totalDescentM", header: "Total descent", cell: ({ getValue }) => formatElevation(getValue() as number, unitSystem) },
      {
        accessorKey: "steepestGrade",
        header: "Steepest 1 km",
        sortUndefined: "last",
        cell: ({ getValue }) => (getValue() === null ? "—" : formatGrade(getValue() as number)),
      },
      { accessorKey: "descentCount", header: "Descents" },
      { accessorKey: "uploadedByName", header: "Uploaded by", cell: ({ getValue }) => (getValue() as string | null) ?? "—" },
      { accessorKey: "createdAt", header: "Date", sortingFn: "datetime", cell: ({ getValue }) => new Date(getValue() as string).toLocaleDateString() },
      ...(canWrite
        ? [
            {
              id: "actions",
              enableSorting: false,
              header: () => <span className="sr-only">Actions</span>,
              cell: ({ row }) => <DeleteButton name={row.original.name} busy={remove.isPending} onConfirm={() => remove.mutate(row.original.id)} />,
            } satisfies ColumnDef<RouteRow, unknown>,
          ]
        : []),
    ],
    [canWrite, unitSystem, rename, remove],
  );
  return (
    <DataTable
      columns={columns}
      data={routes}
      searchLabel="Search routes"
      getRowId={(r) => r.id}
      initialSort={[{ id: "createdAt", desc: true }]}
      empty={
        <EmptyState title="No routes yet">
          {canWrite ? "Drop a GPX file above. Export it from your trip planner or GPS with elevation included." : "A planner or owner of this organisation uploads routes."}
        </EmptyState>
      }
    />
  );
}

function RouteLink({ route }: { route: RouteRow }) {
  return (
    <Link href={`/routes/${route.id}`} className="font-medium text-pine-700 underline">
      {route.name}
    </Link>
  );
}

function NameCell({ route, onRename }: { route: RouteRow; onRename: (name: string) => Promise<unknown> }) {
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(route.name);
  if (!editing) {
    return (
      <span className="inline-flex items-center gap-2">
        <RouteLink route={route} />
        <Button size="sm" variant="ghost" onClick={() => (setName(route.name), setEditing(true))} aria-label={`Rename ${route.name}`}>
          Rename
        </Button>
      </span>
    );
  }
  return (
    <form
      className="flex items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        void onRename(name).then(() => setEditing(false), () => undefined);
      }}
    >
      <input aria-label="New name" value={name} maxLength={120} onChange={(e) => setName(e.target.value)} className={`${controlClasses(false)} h-8 w-56`} autoFocus />
      <Button size="sm" type="submit">Save</Button>
      <Button size="sm" variant="ghost" onClick={() => setEditing(false)}>Cancel</Button>
    </form>
  );
}

function DeleteButton({ name, busy, onConfirm }: { name: string; busy: boolean; onConfirm: () => void }) {
  const [asking, setAsking] = useState(false);
  if (!asking) return <Button size="sm" variant="ghost" onClick={() => setAsking(true)}>Delete</Button>;
  return (
    <span className="inline-flex items-center gap-2">
      <span className="text-xs text-ink-soft">Delete {name}?</span>
      <Button size="sm" variant="danger" busy={busy} onClick={onConfirm}>Delete</Button>
      <Button size="sm" variant="ghost" onClick={() => setAsking(false)}>Keep</Button>
    </span>
  );
}
