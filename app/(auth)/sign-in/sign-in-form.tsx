"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { signInSchema } from "@/lib/validation/auth";

type Values = z.input<typeof signInSchema>;

const MESSAGES: Record<string, string> = {
  RateLimited: "Too many attempts. Wait 15 minutes, then try again.",
  EmailUnconfirmed: "Confirm your e-mail address first: open the link in the message we sent you.",
};
const GENERIC = "That e-mail address and password do not match. Check both and try again.";

export function SignInForm({ callbackUrl, defaultEmail = "" }: { callbackUrl: string; defaultEmail?: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(signInSchema), defaultValues: { email: defaultEmail, password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    const result = await signIn("credentials", { redirect: false, email: values.email, password: values.password });
    if (!result || result.error) {
      setProblem(MESSAGES[result?.error ?? ""] ?? GENERIC);
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Field label="E-mail" error={errors.email?.message}>
        {(ids) => <input {...ids} type="email" autoComplete="email" className={`${controlClasses(!!errors.email)} h-10`} {...form.register("email")} />}
      </Field>
      <Field label="Password" error={errors.password?.message}>
        {(ids) => (
          <input {...ids} type="password" autoComplete="current-password" className={`${controlClasses(!!errors.password)} h-10`} {...form.register("password")} />
        )}
      </Field>
      <Button type="submit" busy={isSubmitting} className="w-full">
        Sign in
      </Button>
      <p className="text-center text-sm">
        <Link href="/reset-password" className="text-ink-soft underline">Forgot your password?</Link>
      </p>
    </form>
  );
}
