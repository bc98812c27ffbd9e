/** The four roles of an organisation member. Stored as-is in `memberships.role`. */
export const ROLES = ["admin", "designer", "facility_manager", "occupant"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  designer: "Designer",
  facility_manager: "Facility manager",
  occupant: "Occupant",
};
