import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/lib/server/session";
import { AuthCard } from "../auth-card";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

/** Only same-site paths are followed after sign-in (no open redirect). */
function safeCallback(value: string | string[] | undefined): string {
  const v = Array.isArray(value) ? value[0] : value;
  if (!v) return "/plans";
  try {
    const url = new URL(v, "http://fadeline.invalid");
    return url.origin === "http://fadeline.invalid" ? `${url.pathname}${url.search}` : "/plans";
  } catch {
    return "/plans";
  }
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const callbackUrl = safeCallback(params.callbackUrl);
  if (await getSessionUser()) redirect(callbackUrl);
  const email = typeof params.email === "string" ? params.email : "";
  return (
    <AuthCard
      title="Sign in"
      intro={
        <>
          New to Fadeline? <Link href="/sign-up" className="font-medium text-pine-700 underline">Create an account</Link>.
        </>
      }
    >
      <SignInForm callbackUrl={callbackUrl} defaultEmail={email} />
    </AuthCard>
  );
}
