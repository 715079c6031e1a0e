"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "sonner";
import { Button, buttonClasses } from "@/components/ui/button";
import { api } from "@/lib/client/api";

/** Edit, duplicate and delete for planners and owners. Deleting asks first and names what goes with the plan. */
export function PlanActions({ planId, name }: { planId: string; name: string }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState<"copy" | "delete" | null>(null);
  const duplicate = async () => {
    setBusy("copy");
    try {
      const { plan } = await api<{ plan: { id: string; name: string } }>(`/api/plans/${planId}/duplicate`, { method: "POST", body: {} });
      toast.success(`Copied as “${plan.name}”.`);
      router.push(`/plans/${plan.id}`);
    } catch (error) {
      toast.error((error as Error).message);
    } finally {
      setBusy(null);
    }
  };
  const remove = async () => {
    setBusy("delete");
    try {
      await api(`/api/plans/${planId}`, { method: "DELETE" });
      toast.success(`${name} deleted.`);
      router.replace("/plans");
      router.refresh();
    } catch (error) {
      toast.error((error as Error).message);
      setBusy(null);
      setAsking(false);
    }
  };
  if (asking) {
    return (
      <span className="inline-flex flex-wrap items-center gap-2">
        <span className="text-sm">Delete {name} and its scenarios? Routes and rigs stay.</span>
        <Button variant="danger" busy={busy === "delete"} onClick={remove}>Delete</Button>
        <Button variant="ghost" onClick={() => setAsking(false)}>Keep</Button>
      </span>
    );
  }
  return (
    <div className="flex flex-wrap gap-2">
      <Link href={`/plans/${planId}/edit`} className={buttonClasses("secondary") + " no-underline"}>Edit plan</Link>
      <Button variant="secondary" busy={busy === "copy"} onClick={duplicate}>Duplicate</Button>
      <Button variant="ghost" onClick={() => setAsking(true)}>Delete</Button>
    </div>
  );
}
