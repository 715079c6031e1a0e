import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { devInboxEnabled } from "@/lib/env";
import { getSessionUser } from "@/lib/server/session";
import { AuthCard } from "../auth-card";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage() {
  if (await getSessionUser()) redirect("/plans");
  return (
    <AuthCard
      title="Create your Fadeline account"
      intro={
        <>
          You get your own organisation for your rigs and plans; a tour operator can invite you to theirs later.
          Already have an account? <Link href="/sign-in" className="font-medium text-pine-700 underline">Sign in</Link>.
        </>
      }
    >
      <SignUpForm devInbox={devInboxEnabled()} />
    </AuthCard>
  );
}
