"use client";

import { useQueryClient } from "@tanstack/react-query";

export const memberKey = (organisationId: string) => ["organisations", organisationId, "members"] as const;
export const invitationKey = (organisationId: string) => ["organisations", organisationId, "invitations"] as const;

/** After a change, members, invitations and the audit list of the organisation are read again. */
export function useRefreshOrganisation(organisationId: string) {
  const client = useQueryClient();
  return () => client.invalidateQueries({ queryKey: ["organisations", organisationId] });
}
