"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { PasswordInput } from "@/components/password-input";
import { Button } from "@/components/ui/button";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { applyFieldErrors } from "@/lib/client/api";
import { newPasswordSchema, PASSWORD_MIN, personNameSchema } from "@/lib/validation/auth";

const schema = z.object({ name: personNameSchema, password: newPasswordSchema });
type Values = z.input<typeof schema>;

/** The invitee's new account: their name and a password; the address is the one the invitation went to. */
export function NewAccountForm({ email, onSubmit }: { email: string; onSubmit: (v: { name: string; password: string }) => Promise<void> }) {
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name: "", password: "" } });
  const { errors, isSubmitting } = form.formState;
  const submit = form.handleSubmit(async (values) => {
    setProblem(null);
    try {
      await onSubmit({ name: values.name.trim(), password: values.password });
    } catch (error) {
      const fields = (error as { fields?: Record<string, string[]> }).fields ?? {};
      const mapped = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k.replace(/^account\./, ""), v]));
      if (!applyFieldErrors(Object.assign(error as object, { fields: mapped }), form.setError)) setProblem((error as Error).message);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <p className="text-sm text-ink-soft">Create your account for {email} to accept.</p>
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Field label="Your name" error={errors.name?.message}>
        {(ids) => <input {...ids} autoComplete="name" className={`${controlClasses(!!errors.name)} h-10`} {...form.register("name")} />}
      </Field>
      <Field label="Password" error={errors.password?.message} hint={`At least ${PASSWORD_MIN} characters.`}>
        {(ids) => <PasswordInput {...ids} autoComplete="new-password" invalid={!!errors.password} {...form.register("password")} />}
      </Field>
      <Button type="submit" busy={isSubmitting} className="w-full">Create account and join</Button>
    </form>
  );
}
