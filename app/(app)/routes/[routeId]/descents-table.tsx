"use client";

import type { ColumnDef } from "@tanstack/react-table";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import type { Descent, PlacedWaypoint } from "@/lib/route";
import { formatDistance, formatElevation, formatGrade, type UnitSystem } from "@/lib/units";

type Row = Descent & { number: number; near: string | null };

/** The waypoint nearest to the top of a descent (within 1 km), so a descent can be named as people know it. */
function nearestName(d: Descent, waypoints: PlacedWaypoint[]): string | null {
  let best: PlacedWaypoint | null = null;
  for (const w of waypoints) {
    if (w.name && Math.abs(w.distanceM! - d.startDistanceM) <= 1000 && (!best || Math.abs(w.distanceM! - d.startDistanceM) < Math.abs(best.distanceM! - d.startDistanceM))) best = w;
  }
  return best?.name ?? null;
}

export function DescentsTable({ descents, waypoints, unitSystem }: { descents: Descent[]; waypoints: PlacedWaypoint[]; unitSystem: UnitSystem }) {
  const rows: Row[] = descents.map((d, i) => ({ ...d, number: i + 1, near: nearestName(d, waypoints) }));
  const columns: ColumnDef<Row, unknown>[] = [
    { accessorKey: "number", header: "#" },
    {
      id: "where",
      accessorFn: (r) => r.startDistanceM,
      header: "From – to",
      cell: ({ row }) => (
        <span>
          {formatDistance(row.original.startDistanceM, unitSystem)} – {formatDistance(row.original.endDistanceM, unitSystem)}
          {row.original.near && <span className="block text-xs text-ink-muted">near {row.original.near}</span>}
        </span>
      ),
    },
    { accessorKey: "dropM", header: "Drop", cell: ({ getValue }) => formatElevation(getValue() as number, unitSystem) },
    { accessorKey: "lengthM", header: "Length", cell: ({ getValue }) => formatDistance(getValue() as number, unitSystem) },
    { accessorKey: "meanGrade", header: "Mean grade", cell: ({ getValue }) => formatGrade(getValue() as number) },
    { accessorKey: "steepest1kmGrade", header: "Steepest 1 km", cell: ({ getValue }) => formatGrade(getValue() as number) },
    { accessorKey: "steepest200mGrade", header: "Steepest 200 m", cell: ({ getValue }) => formatGrade(getValue() as number) },
    {
      id: "heights",
      accessorFn: (r) => r.startElevationM,
      header: "Top → bottom",
      cell: ({ row }) => `${formatElevation(row.original.startElevationM, unitSystem)} → ${formatElevation(row.original.endElevationM, unitSystem)}`,
    },
  ];
  return (
    <DataTable
      columns={columns}
      data={rows}
      getRowId={(r) => String(r.number)}
      empty={<EmptyState title="No descents on this route">No downhill section drops 50 m or more.</EmptyState>}
    />
  );
}
