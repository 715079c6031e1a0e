"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { api } from "@/lib/client/api";

export function DeleteRigButton({ rigId, name }: { rigId: string; name: string }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!asking) return <Button variant="ghost" onClick={() => setAsking(true)}>Delete</Button>;
  const remove = async () => {
    setBusy(true);
    try {
      await api(`/api/rigs/${rigId}`, { method: "DELETE" });
      toast.success(`${name} deleted.`);
      router.replace("/rigs");
      router.refresh();
    } catch (error) {
      toast.error((error as Error).message);
      setBusy(false);
      setAsking(false);
    }
  };
  return (
    <span className="inline-flex items-center gap-2">
      <span className="text-sm">Delete {name}?</span>
      <Button variant="danger" busy={busy} onClick={remove}>Delete</Button>
      <Button variant="ghost" onClick={() => setAsking(false)}>Keep</Button>
    </span>
  );
}
