import type { Metadata } from "next";
import Link from "next/link";
import { SafetyCaution } from "@/components/safety-caution";
import { PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { requireWorkContext } from "@/lib/server/work-context";

export const metadata: Metadata = { title: "Plans" };

export default async function PlansPage() {
  const { active } = await requireWorkContext("/plans");
  return (
    <>
      <PageHeader
        title="Plans"
        description={`A plan puts a route together with the rigs of a convoy and shows, descent by descent, where each rig's brakes will run hot and what to do about it. Plans of ${active.name} appear here.`}
      />
      <EmptyState title="No plans yet">
        <p>Building plans is the next part of Fadeline to arrive. It needs a route and at least one rig:</p>
        <ol className="mt-3 list-decimal space-y-1 pl-5 text-left">
          <li>
            Upload the GPX of your trip on <Link href="/routes" className="text-pine-700 underline">Routes</Link>.
          </li>
          <li>
            Describe each tow vehicle, trailer and load on <Link href="/rigs" className="text-pine-700 underline">Rigs</Link>.
          </li>
          <li>Put them together in a plan and read the advice for every descent.</li>
        </ol>
      </EmptyState>
      <SafetyCaution className="mt-6" />
    </>
  );
}
