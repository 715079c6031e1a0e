import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { requireWorkContext } from "@/lib/server/work-context";

export const metadata: Metadata = { title: "Rigs" };

export default async function RigsPage() {
  const { active } = await requireWorkContext("/rigs");
  return (
    <>
      <PageHeader
        title="Rigs"
        description={`Tow vehicles, trailers and caravans of ${active.name}, with their loads, brakes and ratings.`}
      />
      <EmptyState title="No rigs yet">
        Describing rigs is not open yet. When it is, you will enter a tow vehicle, an optional trailer or caravan and
        the load, and Fadeline will check the masses against their ratings.
      </EmptyState>
    </>
  );
}
