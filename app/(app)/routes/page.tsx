import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { requireWorkContext } from "@/lib/server/work-context";

export const metadata: Metadata = { title: "Routes" };

export default async function RoutesPage() {
  const { active } = await requireWorkContext("/routes");
  return (
    <>
      <PageHeader
        title="Routes"
        description={`The GPX tracks ${active.name} plans to drive, cleaned up, with every descent found and measured.`}
      />
      <EmptyState title="No routes yet">
        Uploading GPX files is not open yet. When it is, you will drop a file here and see its length, climbs and
        descents before saving it.
      </EmptyState>
    </>
  );
}
