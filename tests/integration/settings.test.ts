import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { users } from "@/db/schema";
import { PATCH } from "@/app/api/me/settings/route";
import { call, fieldPaths, organisationWithEveryRole, type Account } from "@/tests/support/api";
import { closeDatabase, getDb } from "@/tests/support/db";

let admin: Account;
let occupant: Account;

async function storedUnitSystem(account: Account): Promise<string | undefined> {
  const [row] = await getDb().select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, account.userId));
  return row?.unitSystem;
}

function patch(options: { token?: string; body?: unknown; rawBody?: string }) {
  return call<{ unitSystem?: string; error?: string }>(PATCH, "PATCH", { path: "/api/me/settings", ...options });
}

beforeAll(async () => {
  const org = await organisationWithEveryRole("settings");
  admin = org.admin;
  occupant = org.occupant;
});

afterAll(closeDatabase);

describe("PATCH /api/me/settings", () => {
  it("switches the member's unit system to IP and back to SI, stored on the user", async () => {
    expect(await storedUnitSystem(admin)).toBe("si");
    const toIp = await patch({ token: admin.token, body: { unitSystem: "ip" } });
    expect(toIp.status).toBe(200);
    expect(toIp.body).toEqual({ unitSystem: "ip" });
    expect(await storedUnitSystem(admin)).toBe("ip");

    const toSi = await patch({ token: admin.token, body: { unitSystem: "si" } });
    expect(toSi.status).toBe(200);
    expect(toSi.body).toEqual({ unitSystem: "si" });
    expect(await storedUnitSystem(admin)).toBe("si");
  });

  it("is open to every role, and changes only the caller's own setting", async () => {
    const res = await patch({ token: occupant.token, body: { unitSystem: "ip" } });
    expect(res.status).toBe(200);
    expect(await storedUnitSystem(occupant)).toBe("ip");
    expect(await storedUnitSystem(admin)).toBe("si");
  });

  it("answers 400 naming the field for an unknown unit system, and writes nothing", async () => {
    const res = await patch({ token: admin.token, body: { unitSystem: "imperial" } });
    expect(res.status).toBe(400);
    expect(res.body.error).toBe("invalid_input");
    expect(fieldPaths(res.body)).toEqual(["unitSystem"]);
    expect(await storedUnitSystem(admin)).toBe("si");
  });

  it("answers 400 for a missing field, an unknown field and a body that is not JSON, writing nothing", async () => {
    const missing = await patch({ token: admin.token, body: {} });
    expect(missing.status).toBe(400);
    expect(fieldPaths(missing.body)).toEqual(["unitSystem"]);

    const unknown = await patch({ token: admin.token, body: { unitSystem: "ip", theme: "dark" } });
    expect(unknown.status).toBe(400);
    expect(fieldPaths(unknown.body)).toEqual(["theme"]);

    const notJson = await patch({ token: admin.token, rawBody: "{unitSystem:" });
    expect(notJson.status).toBe(400);
    expect(await storedUnitSystem(admin)).toBe("si");
  });

  it("answers 401 without a session", async () => {
    const res = await patch({ body: { unitSystem: "ip" } });
    expect(res.status).toBe(401);
  });
});
