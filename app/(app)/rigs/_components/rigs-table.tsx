"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { buttonClasses } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import { formatMass, type UnitSystem } from "@/lib/units";

export interface RigListRow {
  id: string;
  name: string;
  vehicle: string;
  trailer: string | null;
  combinationKg: number;
  status: { tone: "pine" | "danger" | "notice"; text: string };
  region: string;
  updatedAt: string;
}

export function RigsTable({ rows, canWrite, unitSystem }: { rows: RigListRow[]; canWrite: boolean; unitSystem: UnitSystem }) {
  const columns: ColumnDef<RigListRow, unknown>[] = [
    { accessorKey: "name", header: "Rig", cell: ({ row }) => <Link href={`/rigs/${row.original.id}`} className="font-medium text-pine-700 underline">{row.original.name}</Link> },
    { accessorKey: "vehicle", header: "Tow vehicle" },
    { accessorKey: "trailer", header: "Trailer", cell: ({ getValue }) => (getValue() as string | null) ?? "none" },
    { accessorKey: "combinationKg", header: "Combination", cell: ({ getValue }) => formatMass(getValue() as number, unitSystem) },
    { id: "status", accessorFn: (r) => r.status.text, header: "Ratings", cell: ({ row }) => <Badge tone={row.original.status.tone}>{row.original.status.text}</Badge> },
    { accessorKey: "region", header: "Rules of" },
    { accessorKey: "updatedAt", header: "Changed", sortingFn: "datetime", cell: ({ getValue }) => new Date(getValue() as string).toLocaleDateString() },
  ];
  return (
    <DataTable
      columns={columns}
      data={rows}
      searchLabel="Search rigs"
      getRowId={(r) => r.id}
      initialSort={[{ id: "name", desc: false }]}
      empty={
        <EmptyState title="No rigs yet" action={canWrite ? <Link href="/rigs/new" className={buttonClasses("primary") + " no-underline"}>New rig</Link> : undefined}>
          Describe each tow vehicle with its trailer or caravan and its load: masses, ratings, brakes, tyres and engine braking.
        </EmptyState>
      }
    />
  );
}
