// Names reach PostgreSQL through server actions, which do not pass the JSON body checks of the
// API: a NUL character (PostgreSQL refuses it in any text value, "PostgreSQL documentation,
// 8.3 Character Types") must stop at validation with a field message, not fail in the database.
import { describe, expect, it } from "vitest";
import { ZAcceptInvite, ZSignUp } from "@/lib/validation/auth";

const signUp = { email: "coach@example.test", password: "long enough password", name: "Ada", teamName: "North Rings", timeZone: "Europe/Lisbon" };

describe("names in the sign-up and invite forms", () => {
  it("accept an ordinary name", () => {
    expect(ZSignUp.safeParse(signUp).success).toBe(true);
    expect(ZAcceptInvite.safeParse({ name: "Ada", password: "long enough password" }).success).toBe(true);
  });

  it("refuse a NUL character with a message on the field", () => {
    for (const field of ["name", "teamName"] as const) {
      const result = ZSignUp.safeParse({ ...signUp, [field]: "Ad\u0000a" });
      expect(result.success).toBe(false);
      expect(result.error?.issues.map((i) => i.path.join("."))).toEqual([field]);
    }
    expect(ZAcceptInvite.safeParse({ name: "\u0000", password: "long enough password" }).success).toBe(false);
  });
});
