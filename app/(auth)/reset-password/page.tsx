import type { Metadata } from "next";
import { AuthCard } from "../auth-card";
import { RequestResetForm, SetPasswordForm } from "./reset-forms";

export const metadata: Metadata = { title: "Reset your password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (typeof token === "string" && token) {
    return (
      <AuthCard title="Choose a new password" intro="Every device signed in to your account will be signed out.">
        <SetPasswordForm token={token} />
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Reset your password" intro="We will mail you a link to choose a new one.">
      <RequestResetForm />
    </AuthCard>
  );
}
