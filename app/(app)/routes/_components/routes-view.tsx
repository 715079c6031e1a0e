"use client";

import { useQuery } from "@tanstack/react-query";
import type { RouteListRow } from "@/lib/server/routes/routes-dal";
import type { UnitSystem } from "@/lib/units";
import { api } from "@/lib/client/api";
import { RoutesTable } from "./routes-table";
import { UploadZone } from "./upload-zone";

export type RouteRow = Omit<RouteListRow, "createdAt" | "updatedAt"> & { createdAt: string | Date; updatedAt: string | Date };

export const routesKey = (organisationId: string) => ["organisations", organisationId, "routes"] as const;

/** The routes screen: the drop zone for planners and owners, and the table everyone reads. */
export function RoutesView({
  organisationId,
  canWrite,
  unitSystem,
  initialRoutes,
}: {
  organisationId: string;
  canWrite: boolean;
  unitSystem: UnitSystem;
  initialRoutes: RouteRow[];
}) {
  const routes = useQuery({
    queryKey: routesKey(organisationId),
    queryFn: () => api<{ routes: RouteRow[] }>(`/api/organisations/${organisationId}/routes`).then((r) => r.routes),
    initialData: initialRoutes,
  });
  return (
    <div className="grid gap-6">
      {canWrite ? (
        <UploadZone organisationId={organisationId} unitSystem={unitSystem} />
      ) : (
        <p className="text-sm text-ink-muted">You can read this organisation&apos;s routes; planners and owners upload them.</p>
      )}
      {routes.isError && <p className="text-sm text-danger-600">Could not refresh the list: {routes.error.message}</p>}
      <RoutesTable organisationId={organisationId} routes={routes.data} canWrite={canWrite} unitSystem={unitSystem} />
    </div>
  );
}
