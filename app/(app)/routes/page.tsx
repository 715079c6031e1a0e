import type { Metadata } from "next";
import { getDb } from "@/db";
import { PageHeader } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { listRoutes } from "@/lib/server/routes/routes-dal";
import { requireWorkContext } from "@/lib/server/work-context";
import { RoutesView } from "./_components/routes-view";

export const metadata: Metadata = { title: "Routes" };

export default async function RoutesPage() {
  const { user, active } = await requireWorkContext("/routes");
  const routes = await listRoutes(getDb(), user, active.id);
  return (
    <>
      <PageHeader
        title="Routes"
        description={`The GPX tracks ${active.name} plans to drive. Fadeline cleans each track, smooths its elevation and finds every descent that loses at least 50 m.`}
      />
      <RoutesView
        organisationId={active.id}
        canWrite={can(active.role, "content.create")}
        unitSystem={user.unitSystem}
        initialRoutes={routes}
      />
    </>
  );
}
