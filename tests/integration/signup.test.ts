import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as signup } from "@/app/api/v1/signup/route";
import { db } from "@/db/client";
import { teams, users } from "@/db/schema";
import { uniqueEmail } from "../support/factories";
import { call } from "../support/http";

describe("POST /api/v1/signup", () => {
  it("creates a team with its time zone and makes the person its owner", async () => {
    const email = uniqueEmail("Founder").toUpperCase();
    const res = await call(signup, {
      json: { email: `  ${email} `, password: "a-strong-password", name: "Ada", teamName: "Ring Room", timeZone: "Asia/Tokyo" },
    });
    expect(res.status).toBe(201);
    const { userId, teamId } = res.data as { userId: string; teamId: string };
    const [user] = await db.select().from(users).where(eq(users.id, userId));
    const [team] = await db.select().from(teams).where(eq(teams.id, teamId));
    expect(user?.email).toBe(email.toLowerCase()); // normalised
    expect(user?.role).toBe("owner");
    expect(user?.teamId).toBe(teamId);
    expect(user?.passwordHash).not.toContain("a-strong-password");
    expect(team?.timeZone).toBe("Asia/Tokyo");
    expect(team?.name).toBe("Ring Room");
    expect(JSON.stringify(res.data)).not.toContain("$2"); // no hash in the response
  });

  it("refuses a second account for the same e-mail with 409", async () => {
    const body = { email: uniqueEmail("dup"), password: "a-strong-password", name: "A", teamName: "T", timeZone: "UTC" };
    expect((await call(signup, { json: body })).status).toBe(201);
    expect((await call(signup, { json: body })).status).toBe(409);
  });

  it.each([
    [{ email: "not-an-email", password: "a-strong-password", name: "A", teamName: "T", timeZone: "UTC" }, "email"],
    [{ email: "a@b.test", password: "short", name: "A", teamName: "T", timeZone: "UTC" }, "password"],
    [{ email: "a@b.test", password: "a-strong-password", name: "", teamName: "T", timeZone: "UTC" }, "name"],
    [{ email: "a@b.test", password: "a-strong-password", name: "A", teamName: "T", timeZone: "Mars/Olympus" }, "timeZone"],
    [{ email: "a@b.test", password: "a-strong-password", name: "A", teamName: "T", timeZone: "UTC", role: "owner" }, ""],
  ])("answers 422 naming the field for %j", async (body, field) => {
    const res = await call(signup, { json: body });
    expect(res.status).toBe(422);
    expect(res.data.error?.code).toBe("validation_failed");
    if (field) expect(res.data.error?.issues?.map((i) => i.path)).toContain(field);
  });
});
