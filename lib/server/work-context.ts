import "server-only";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getDb } from "@/db";
import { listOrganisationsForUser, pickActiveOrganisation, type OrganisationSummary } from "./organisations";
import { getSessionUser, type SessionUser } from "./session";

export interface WorkContext {
  user: SessionUser;
  organisations: OrganisationSummary[];
  /** The organisation the pages show; the role is today's role from the database. */
  active: OrganisationSummary;
}

const loadContext = cache(async () => {
  const user = await getSessionUser();
  if (!user) return { user: null, organisations: [], active: null } as const;
  const organisations = await listOrganisationsForUser(getDb(), user.userId);
  return { user, organisations, active: pickActiveOrganisation(organisations, user.activeOrganisationId) };
});

/**
 * For pages of the signed-in area: the context, or a redirect to sign-in that comes back here. Someone
 * signed in who belongs to no organisation any more is sent to create one.
 */
export async function requireWorkContext(path: string): Promise<WorkContext> {
  const { user, organisations, active } = await loadContext();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  if (!active) redirect("/new-organisation");
  return { user, organisations, active };
}

/** The signed-in user for pages outside the work area (null when signed out). */
export async function getSignedInUser(): Promise<SessionUser | null> {
  return (await loadContext()).user;
}
