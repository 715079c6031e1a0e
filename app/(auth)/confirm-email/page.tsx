import type { Metadata } from "next";
import { AuthCard } from "../auth-card";
import { ConfirmEmail } from "./confirm-email";

export const metadata: Metadata = { title: "Confirm your e-mail" };

export default async function ConfirmEmailPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <AuthCard title="Confirm your e-mail address" intro="One click and your account is ready.">
      <ConfirmEmail token={typeof token === "string" ? token : ""} />
    </AuthCard>
  );
}
