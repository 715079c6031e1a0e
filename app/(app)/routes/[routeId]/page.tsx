import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getDb } from "@/db";
import { RouteViewPanel } from "@/components/route-view/route-view-panel";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardHeader, PageHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { AppError } from "@/lib/errors";
import { getRoute } from "@/lib/server/routes/routes-dal";
import { requireWorkContext } from "@/lib/server/work-context";
import { formatDistance, formatElevation } from "@/lib/units";
import { DescentsTable } from "./descents-table";

export const metadata: Metadata = { title: "Route" };

async function load(routeId: string) {
  const { user } = await requireWorkContext(`/routes/${routeId}`);
  try {
    return { user, route: await getRoute(getDb(), user, routeId) };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

export default async function RoutePage({ params }: { params: Promise<{ routeId: string }> }) {
  const { routeId } = await params;
  const { user, route } = await load(routeId);
  const units = user.unitSystem;
  const figures = [
    ["Length", formatDistance(route.lengthM, units)],
    ["Total ascent", formatElevation(route.totalAscentM, units)],
    ["Total descent", formatElevation(route.totalDescentM, units)],
    ["Highest point", formatElevation(route.highestM, units)],
    ["Lowest point", formatElevation(route.lowestM, units)],
    ["Descents", String(route.descentCount)],
  ];
  const placed = route.waypoints.filter((w) => w.distanceM !== null);
  return (
    <>
      <PageHeader
        title={route.name}
        description={`From ${route.fileName}, uploaded by ${route.uploadedByName ?? "a former member"} on ${new Date(route.createdAt).toLocaleDateString()}.`}
        actions={
          <div className="flex gap-2">
            <Link href="/routes" className={buttonClasses("ghost") + " no-underline"}>All routes</Link>
            <a href={`/api/routes/${route.id}/gpx`} className={buttonClasses("secondary") + " no-underline"}>Download GPX</a>
          </div>
        }
      />
      <dl className="mb-6 grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6" data-testid="route-figures">
        {figures.map(([label, value]) => (
          <div key={label} className="rounded-lg border border-line bg-surface px-3 py-2">
            <dt className="text-xs text-ink-muted">{label}</dt>
            <dd className="text-lg font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
      <RouteViewPanel view={route.view} unitSystem={units} />
      <div className="mt-6 grid gap-6">
        <Card>
          <CardHeader
            title="Descents"
            description="Downhill sections that lose at least 50 m over at least 250 m; rises of up to 10 m and flat stretches of up to 300 m do not end a descent."
          />
          <div className="p-5">
            <DescentsTable descents={route.descents} waypoints={placed} unitSystem={units} />
          </div>
        </Card>
        {route.warnings.length > 0 && (
          <Notice tone="caution" title="Notes about the file">
            <ul className="list-disc space-y-0.5 pl-4">
              {route.warnings.map((w, i) => (
                <li key={i}>{w.message}</li>
              ))}
            </ul>
          </Notice>
        )}
      </div>
    </>
  );
}
