import type { Metadata } from "next";
import { RigForm } from "@/components/rig-form/rig-form";
import { PageHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { RIG_PRESETS } from "@/lib/analysis/presets";
import { can } from "@/lib/auth/permissions";
import { rigToForm } from "@/lib/rig-form/convert";
import { requireWorkContext } from "@/lib/server/work-context";
import { MID_SIZE_UTE, UTE_LOAD } from "@/lib/thermal";

export const metadata: Metadata = { title: "New rig" };

export default async function NewRigPage() {
  const { user, active } = await requireWorkContext("/rigs/new");
  if (!can(active.role, "content.create")) {
    return <Notice tone="caution" title="Planners and owners add rigs">Your role in {active.name} lets you read rigs, not add them.</Notice>;
  }
  const presets = [
    { id: "ute-and-caravan", label: "Dual-cab ute and tandem caravan", rig: RIG_PRESETS.rigs["ute-and-caravan"] },
    { id: "wagon-and-camper", label: "4x4 wagon and camper trailer", rig: RIG_PRESETS.rigs["wagon-and-camper"] },
    { id: "ute-only", label: "Dual-cab ute, no trailer", rig: { vehicle: MID_SIZE_UTE, load: UTE_LOAD } },
  ];
  return (
    <>
      <PageHeader title="New rig" description="Start from a preset and replace its typical values with your own, or fill the form in from scratch." />
      <RigForm organisationId={active.id} initial={rigToForm(presets[0]!.rig, "", "AU", user.unitSystem)} presets={presets} unitSystem={user.unitSystem} />
    </>
  );
}
