"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { PasswordInput } from "@/components/password-input";
import { Button, buttonClasses } from "@/components/ui/button";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, applyFieldErrors } from "@/lib/client/api";
import { emailOnlySchema, newPasswordSchema, PASSWORD_MIN } from "@/lib/validation/auth";

export function RequestResetForm() {
  const [message, setMessage] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<z.input<typeof emailOnlySchema>>({ resolver: zodResolver(emailOnlySchema), defaultValues: { email: "" } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    try {
      const result = await api<{ message: string }>("/api/account/password-reset", { body: values });
      setMessage(result.message);
    } catch (error) {
      if (!applyFieldErrors(error, form.setError)) setProblem((error as Error).message);
    }
  });
  if (message) return <Notice title="Check your inbox">{message}</Notice>;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Field label="E-mail" error={errors.email?.message}>
        {(ids) => <input {...ids} type="email" autoComplete="email" className={`${controlClasses(!!errors.email)} h-10`} {...form.register("email")} />}
      </Field>
      <Button type="submit" busy={isSubmitting} className="w-full">Send the link</Button>
    </form>
  );
}

const setSchema = z.object({ password: newPasswordSchema });

export function SetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<z.input<typeof setSchema>>({ resolver: zodResolver(setSchema), defaultValues: { password: "" } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async ({ password }) => {
    setProblem(null);
    try {
      await api("/api/account/password-reset/complete", { body: { token, password } });
      setDone(true);
    } catch (error) {
      if (!applyFieldErrors(error, form.setError)) setProblem((error as Error).message);
    }
  });
  if (done) {
    return (
      <div className="space-y-4">
        <Notice title="Password changed">Sign in with your new password.</Notice>
        <Link href="/sign-in" className={buttonClasses("primary") + " w-full no-underline"}>Sign in</Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Field label="New password" error={errors.password?.message} hint={`At least ${PASSWORD_MIN} characters.`}>
        {(ids) => <PasswordInput {...ids} autoComplete="new-password" invalid={!!errors.password} {...form.register("password")} />}
      </Field>
      <Button type="submit" busy={isSubmitting} className="w-full">Save the new password</Button>
    </form>
  );
}
