"use client";

import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { signIn, signOut } from "next-auth/react";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ROLE_DESCRIPTIONS, ROLE_LABELS, type Role } from "@/lib/auth/permissions";
import { api } from "@/lib/client/api";
import { SignInForm } from "../sign-in/sign-in-form";
import { NewAccountForm } from "./new-account-form";

interface Preview {
  organisationName: string;
  role: Role;
  email: string;
  invitedByName: string | null;
  expiresAt: string;
  accountExists: boolean;
}

export function AcceptInvitation({ token, signedInAs }: { token: string; signedInAs: { email: string; name: string } | null }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const preview = useQuery({
    queryKey: ["invitation-preview", token],
    queryFn: () => api<{ invitation: Preview }>("/api/invitations/preview", { body: { token } }),
    enabled: token.length > 0,
    retry: false,
  });

  if (!token) return <Notice tone="danger">This link is missing its code. Open the link from the invitation e-mail again.</Notice>;
  if (preview.isPending) return <p className="text-sm text-ink-muted">Reading the invitation…</p>;
  if (preview.isError) return <Notice tone="danger">{preview.error.message}</Notice>;
  const invitation = preview.data.invitation;

  const join = async () => {
    setBusy(true);
    setProblem(null);
    try {
      await api("/api/invitations/accept", { body: { token } });
      router.replace("/organisation");
      router.refresh();
    } catch (error) {
      setProblem((error as Error).message);
      setBusy(false);
    }
  };

  const joinWithNewAccount = async (account: { name: string; password: string }) => {
    await api("/api/invitations/accept", { body: { token, account } });
    const result = await signIn("credentials", { redirect: false, email: invitation.email, password: account.password });
    router.replace(result?.error ? `/sign-in?email=${encodeURIComponent(invitation.email)}` : "/organisation");
    router.refresh();
  };

  return (
    <div className="space-y-5">
      <div className="rounded-lg bg-pine-50 p-4 text-sm">
        <p>
          {invitation.invitedByName ?? "An owner"} invited <strong>{invitation.email}</strong> to join{" "}
          <strong>{invitation.organisationName}</strong> as a <strong>{ROLE_LABELS[invitation.role].toLowerCase()}</strong>.
        </p>
        <p className="mt-1 text-ink-muted">{ROLE_DESCRIPTIONS[invitation.role]}</p>
      </div>
      {problem && <Notice tone="danger">{problem}</Notice>}
      {signedInAs && signedInAs.email === invitation.email && (
        <Button onClick={join} busy={busy} className="w-full">Join {invitation.organisationName}</Button>
      )}
      {signedInAs && signedInAs.email !== invitation.email && (
        <div className="space-y-3">
          <Notice tone="caution">
            You are signed in as {signedInAs.email}, but this invitation is for {invitation.email}.
          </Notice>
          <Button variant="secondary" className="w-full" onClick={() => signOut({ redirect: false }).then(() => router.refresh())}>
            Sign out to continue as {invitation.email}
          </Button>
        </div>
      )}
      {!signedInAs && invitation.accountExists && (
        <div className="space-y-2">
          <p className="text-sm text-ink-soft">Sign in as {invitation.email} to accept.</p>
          <SignInForm callbackUrl={`/invite?token=${encodeURIComponent(token)}`} defaultEmail={invitation.email} />
        </div>
      )}
      {!signedInAs && !invitation.accountExists && <NewAccountForm email={invitation.email} onSubmit={joinWithNewAccount} />}
    </div>
  );
}
