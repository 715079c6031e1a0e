"use client";

import Link from "next/link";
import { useState } from "react";
import { Button, buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";

/** Confirms on a click (a POST), so a mail scanner that opens the link does not use it up. */
export function ConfirmEmail({ token }: { token: string }) {
  const [state, setState] = useState<{ kind: "idle" | "busy" } | { kind: "done"; email: string } | { kind: "error"; message: string }>({ kind: "idle" });

  if (!token) return <Notice tone="danger">This link is missing its code. Open the link from the e-mail again.</Notice>;
  if (state.kind === "done") {
    return (
      <div className="space-y-4">
        <Notice title="Address confirmed">{state.email} is confirmed. Sign in to start.</Notice>
        <Link href={`/sign-in?email=${encodeURIComponent(state.email)}`} className={buttonClasses("primary") + " w-full no-underline"}>
          Sign in
        </Link>
      </div>
    );
  }
  const confirm = async () => {
    setState({ kind: "busy" });
    try {
      const result = await api<{ email: string }>("/api/account/confirm-email", { body: { token } });
      setState({ kind: "done", email: result.email });
    } catch (error) {
      setState({ kind: "error", message: (error as Error).message });
    }
  };
  return (
    <div className="space-y-4">
      {state.kind === "error" && <Notice tone="danger">{state.message}</Notice>}
      <Button onClick={confirm} busy={state.kind === "busy"} className="w-full">
        Confirm my address
      </Button>
    </div>
  );
}
