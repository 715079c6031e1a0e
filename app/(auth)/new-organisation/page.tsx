import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getSignedInUser } from "@/lib/server/work-context";
import { CreateOrganisationForm } from "../../(app)/organisation/_components/create-organisation-card";
import { AuthCard } from "../auth-card";

export const metadata: Metadata = { title: "Create an organisation" };

/** Reached only by someone signed in who belongs to no organisation any more. */
export default async function NewOrganisationPage() {
  if (!(await getSignedInUser())) redirect("/sign-in");
  return (
    <AuthCard title="You are not in any organisation" intro="Create one to keep planning; you will be its owner.">
      <CreateOrganisationForm />
    </AuthCard>
  );
}
