import { describe, expect, test } from "vitest";
import { ROLES } from "@/lib/auth/roles";
import { can, HOME_BY_ROLE, PERMISSIONS, type Action } from "@/lib/permissions";

const ACTIONS = Object.keys(PERMISSIONS) as Action[];

describe("PERMISSIONS", () => {
  test("has actions, each naming only known roles, each role once", () => {
    expect(ACTIONS.length).toBeGreaterThan(5);
    for (const action of ACTIONS) {
      const roles = PERMISSIONS[action] as readonly string[];
      expect(roles.length, action).toBeGreaterThan(0);
      expect(new Set(roles).size, action).toBe(roles.length);
      for (const role of roles) expect(ROLES as readonly string[], `${action}: ${role}`).toContain(role);
    }
  });

  test.each(ACTIONS)("can(\"admin\", %s) is true", (action) => {
    expect(can("admin", action)).toBe(true);
  });

  test("an occupant may only read their own seats", () => {
    expect(ACTIONS.filter((action) => can("occupant", action))).toEqual(["own-seats:read"]);
  });

  test("a facility manager cannot write layouts, projects, scenarios or manage members", () => {
    for (const action of ["layouts:write", "projects:write", "scenarios:write", "members:manage", "members:read"] as const) {
      expect(can("facility_manager", action), action).toBe(false);
    }
    expect(can("facility_manager", "projects:read")).toBe(true);
    expect(can("facility_manager", "seats:manage")).toBe(true);
  });

  test("a designer writes layouts but does not manage members or seats", () => {
    expect(can("designer", "layouts:write")).toBe(true);
    expect(can("designer", "members:manage")).toBe(false);
    expect(can("designer", "seats:manage")).toBe(false);
  });

  test("every role may read its own seats (the floor every signed-in route relies on)", () => {
    for (const role of ROLES) expect(can(role, "own-seats:read"), role).toBe(true);
  });
});

describe("HOME_BY_ROLE", () => {
  test("sends each role to a page it may open", () => {
    expect(Object.keys(HOME_BY_ROLE).sort()).toEqual([...ROLES].sort());
    for (const role of ROLES) {
      const home = HOME_BY_ROLE[role];
      if (home === "/projects") expect(can(role, "projects:read"), role).toBe(true);
      else expect(home, role).toBe("/my-seats");
    }
    expect(HOME_BY_ROLE.occupant).toBe("/my-seats");
  });
});
