import type { Metadata } from "next";
import { RigForm } from "@/components/rig-form/rig-form";
import { PageHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/permissions";
import { rigToForm } from "@/lib/rig-form/convert";
import { loadRig } from "../load-rig";

export const metadata: Metadata = { title: "Edit rig" };

export default async function EditRigPage({ params }: { params: Promise<{ rigId: string }> }) {
  const { rigId } = await params;
  const { user, active, saved } = await loadRig(rigId, `/rigs/${rigId}/edit`);
  if (!can(saved.role, "content.update")) return <Notice tone="caution">Your role in {active.name} lets you read this rig, not change it.</Notice>;
  return (
    <>
      <PageHeader title={`Edit ${saved.name}`} />
      <RigForm organisationId={saved.organisationId} rigId={saved.id} initial={rigToForm(saved.rig, saved.name, saved.region, user.unitSystem)} unitSystem={user.unitSystem} />
    </>
  );
}
