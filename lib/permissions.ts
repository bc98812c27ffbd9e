/**
 * The one permission table. Every route handler, server action and page asks `can(role, action)`
 * (usually through `requireMember` / `withMember`); no role check is written anywhere else.
 */
import type { Role } from "@/lib/auth/roles";

const ALL: readonly Role[] = ["admin", "designer", "facility_manager", "occupant"];
const STAFF: readonly Role[] = ["admin", "designer", "facility_manager"];
const PLANNERS: readonly Role[] = ["admin", "designer"];
const OPERATORS: readonly Role[] = ["admin", "facility_manager"];

export const PERMISSIONS = {
  /** See the organisation's member list and pending invitations. */
  "members:read": ["admin"],
  /** Invite people, change roles, remove members. */
  "members:manage": ["admin"],
  /** Read the audit log. */
  "audit:read": ["admin"],
  /** List and open projects, their layouts, revisions, scenarios and computed results. */
  "projects:read": STAFF,
  /** Create projects and edit their details. */
  "projects:write": PLANNERS,
  /** Save layout revisions (rooms, panels, seats, zones) and restore old ones. */
  "layouts:write": PLANNERS,
  /** Create and edit design scenarios. */
  "scenarios:write": PLANNERS,
  /** Import panel products into the organisation's catalogue and delete them (reading it is `projects:read`). */
  "catalogue:write": PLANNERS,
  /** Run the comfort computation. */
  "compute:run": STAFF,
  /** Assign occupants to seats and manage seat records. */
  "seats:manage": OPERATORS,
  /** Read and handle occupant feedback. */
  "feedback:manage": OPERATORS,
  /** See one's own seats and send feedback about them. */
  "own-seats:read": ALL,
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof PERMISSIONS;

export function can(role: Role, action: Action): boolean {
  return (PERMISSIONS[action] as readonly Role[]).includes(role);
}

/** Where each role lands after signing in. */
export const HOME_BY_ROLE: Record<Role, string> = {
  admin: "/projects",
  designer: "/projects",
  facility_manager: "/projects",
  occupant: "/my-seats",
};
