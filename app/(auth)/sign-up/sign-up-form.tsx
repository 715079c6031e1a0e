"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { PasswordInput } from "@/components/password-input";
import { Button } from "@/components/ui/button";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, applyFieldErrors } from "@/lib/client/api";
import { PASSWORD_MIN, signUpSchema } from "@/lib/validation/auth";

type Values = z.input<typeof signUpSchema>;

export function SignUpForm({ devInbox }: { devInbox: boolean }) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(signUpSchema), defaultValues: { name: "", email: "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    try {
      await api("/api/account/sign-up", { body: values });
      setSentTo(values.email);
    } catch (error) {
      if (!applyFieldErrors(error, form.setError)) setProblem((error as Error).message);
    }
  });

  if (sentTo) {
    return (
      <div className="space-y-4" data-testid="sign-up-sent">
        <Notice title="Check your inbox">
          We sent a message to <strong>{sentTo}</strong>. Open the link in it to confirm your address and finish
          creating your account. It can take a minute to arrive.
        </Notice>
        {devInbox && (
          <p className="text-sm text-ink-muted">
            Running locally? Mail goes to the <Link href="/dev/inbox" className="text-pine-700 underline">local inbox</Link>.
          </p>
        )}
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Field label="Your name" error={errors.name?.message}>
        {(ids) => <input {...ids} autoComplete="name" className={`${controlClasses(!!errors.name)} h-10`} {...form.register("name")} />}
      </Field>
      <Field label="E-mail" error={errors.email?.message}>
        {(ids) => <input {...ids} type="email" autoComplete="email" className={`${controlClasses(!!errors.email)} h-10`} {...form.register("email")} />}
      </Field>
      <Field
        label="Password"
        error={errors.password?.message}
        hint={`At least ${PASSWORD_MIN} characters. Any characters work; a phrase of a few words is easy to remember.`}
      >
        {(ids) => <PasswordInput {...ids} autoComplete="new-password" invalid={!!errors.password} {...form.register("password")} />}
      </Field>
      <Button type="submit" busy={isSubmitting} className="w-full">
        Create account
      </Button>
    </form>
  );
}
