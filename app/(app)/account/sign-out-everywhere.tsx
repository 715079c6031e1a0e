"use client";

import { signOut } from "next-auth/react";
import { useState } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { api } from "@/lib/client/api";

export function SignOutEverywhere() {
  const [busy, setBusy] = useState(false);
  const run = async () => {
    setBusy(true);
    try {
      await api("/api/account/sessions", { method: "DELETE" });
      await signOut({ callbackUrl: "/sign-in" });
    } catch (error) {
      toast.error((error as Error).message);
      setBusy(false);
    }
  };
  return <Button variant="secondary" busy={busy} onClick={run}>Sign out on every device</Button>;
}
