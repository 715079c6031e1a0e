"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import { formatDistance, formatTemperature, type UnitSystem } from "@/lib/units";

export interface PlanListRow {
  id: string;
  name: string;
  routeName: string;
  routeLengthM: number;
  rigCount: number;
  tripDate: string | null;
  ambientC: number;
  updatedAt: string | Date;
  createdByName: string | null;
}

export function PlansTable({ plans, canWrite, unitSystem }: { plans: PlanListRow[]; canWrite: boolean; unitSystem: UnitSystem }) {
  const columns: ColumnDef<PlanListRow, unknown>[] = [
    { accessorKey: "name", header: "Plan", cell: ({ row }) => <Link href={`/plans/${row.original.id}`} className="font-medium text-pine-700 underline">{row.original.name}</Link> },
    { accessorKey: "routeName", header: "Route", cell: ({ row }) => `${row.original.routeName} (${formatDistance(row.original.routeLengthM, unitSystem)})` },
    { accessorKey: "rigCount", header: "Rigs" },
    { accessorKey: "tripDate", header: "Trip date", cell: ({ getValue }) => (getValue() as string | null) ?? "—" },
    { accessorKey: "ambientC", header: "Air", cell: ({ getValue }) => formatTemperature(getValue() as number, unitSystem) },
    { accessorKey: "createdByName", header: "By", cell: ({ getValue }) => (getValue() as string | null) ?? "—" },
    { accessorKey: "updatedAt", header: "Changed", sortingFn: "datetime", cell: ({ getValue }) => new Date(getValue() as string).toLocaleDateString() },
  ];
  return (
    <DataTable
      columns={columns}
      data={plans}
      searchLabel="Search plans"
      getRowId={(p) => p.id}
      initialSort={[{ id: "updatedAt", desc: true }]}
      empty={
        <EmptyState title="No plans yet" action={canWrite ? <Link href="/plans/new" className={buttonClasses("primary") + " no-underline"}>New plan</Link> : undefined}>
          A plan needs a route (upload a GPX on Routes) and at least one rig (describe it on Rigs).
        </EmptyState>
      }
    />
  );
}
