import type { Metadata } from "next";
import { getSessionUser } from "@/lib/server/session";
import { AuthCard } from "../auth-card";
import { AcceptInvitation } from "./accept-invitation";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitePage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const user = await getSessionUser();
  return (
    <AuthCard title="You are invited">
      <AcceptInvitation token={typeof token === "string" ? token : ""} signedInAs={user ? { email: user.email, name: user.name } : null} />
    </AuthCard>
  );
}
