import type { Role } from "@/lib/auth/roles";

/** The demo organisation (invented) and one account per role. Printed by `npm start`. */
export const DEMO_ORGANISATION = "Quayside Workplace Co.";

export const DEMO_ACCOUNTS: ReadonlyArray<{ role: Role; name: string; email: string; password: string }> = [
  { role: "admin", name: "Avery Admin", email: "admin@quayside.example", password: "quayside-admin-1" },
  { role: "designer", name: "Dana Designer", email: "designer@quayside.example", password: "quayside-design-1" },
  { role: "facility_manager", name: "Farid Facilities", email: "facilities@quayside.example", password: "quayside-facility-1" },
  { role: "occupant", name: "Olu Occupant", email: "occupant@quayside.example", password: "quayside-occupant-1" },
];
