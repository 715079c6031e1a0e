"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Field, controlClasses } from "@/components/ui/field";
import { api, applyFieldErrors } from "@/lib/client/api";
import { organisationInputSchema } from "@/lib/validation/organisation";

type Values = z.input<typeof organisationInputSchema>;

/** A new team organisation, owned by the user, which becomes the active one. */
export function CreateOrganisationForm({ onCreated }: { onCreated?: () => void }) {
  const router = useRouter();
  const form = useForm<Values>({ resolver: zodResolver(organisationInputSchema), defaultValues: { name: "" } });
  const { errors, isSubmitting } = form.formState;
  const submit = form.handleSubmit(async (values) => {
    try {
      await api("/api/organisations", { body: values });
      toast.success(`${values.name.trim()} is ready. You are its owner.`);
      form.reset();
      onCreated?.();
      router.replace("/organisation");
      router.refresh();
    } catch (error) {
      if (!applyFieldErrors(error, form.setError)) toast.error((error as Error).message);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-end gap-3">
      <Field label="Name" error={errors.name?.message} className="min-w-48 flex-1">
        {(ids) => <input {...ids} placeholder="e.g. your tour business" className={`${controlClasses(!!errors.name)} h-10`} {...form.register("name")} />}
      </Field>
      <Button type="submit" variant="secondary" busy={isSubmitting}>Create</Button>
    </form>
  );
}

export function CreateOrganisationCard() {
  return (
    <Card>
      <CardHeader title="New organisation" description="For a tour business or club: you become its owner." />
      <div className="p-5">
        <CreateOrganisationForm />
      </div>
    </Card>
  );
}
