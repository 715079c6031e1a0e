/**
 * Who may do what inside an organisation. Policy as data: each action lists the roles allowed to take it, and
 * {@link can} is the only place that reads it. Membership itself (is this user in that organisation at all?)
 * is checked against the database by lib/server/access.ts before this table is consulted.
 */
export const ROLES = ["owner", "planner", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = { owner: "Owner", planner: "Planner", viewer: "Viewer" };

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: "Runs the organisation: invites people, sets roles, and does everything a planner does.",
  planner: "Uploads routes, describes rigs and builds plans.",
  viewer: "Reads routes, rigs and plans; changes nothing.",
};

const POLICY = {
  "organisation.read": ["owner", "planner", "viewer"],
  "organisation.rename": ["owner"],
  "member.read": ["owner", "planner", "viewer"],
  "member.change_role": ["owner"],
  "member.remove": ["owner"],
  "invitation.read": ["owner"],
  "invitation.create": ["owner"],
  "invitation.revoke": ["owner"],
  "audit.read": ["owner"],
  /** Routes, rigs, plans and what later hangs off them. */
  "content.read": ["owner", "planner", "viewer"],
  "content.create": ["owner", "planner"],
  "content.update": ["owner", "planner"],
  "content.delete": ["owner", "planner"],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof POLICY;
export const ACTIONS = Object.keys(POLICY) as Action[];

/** Whether a member with this role may take this action in their organisation. */
export function can(role: Role, action: Action): boolean {
  return (POLICY[action] as readonly Role[]).includes(role);
}
