import { describe, expect, it } from "vitest";
import { can, PERMISSIONS, ROLES } from "@/lib/permissions";
import { navFor } from "@/lib/navigation";

describe("permission map", () => {
  it("lets only staff write ladders and athletes", () => {
    expect(can("owner", "ladders.write")).toBe(true);
    expect(can("coach", "ladders.write")).toBe(true);
    expect(can("athlete", "ladders.write")).toBe(false);
    expect(can("athlete", "athletes.write")).toBe(false);
  });

  it("keeps billing and coach invites with the owner", () => {
    expect(can("owner", "billing.manage")).toBe(true);
    expect(can("coach", "billing.manage")).toBe(false);
    expect(can("coach", "coaches.invite")).toBe(false);
  });

  it("lets every role log and read their own data", () => {
    for (const role of ROLES) {
      expect(can(role, "logs.write")).toBe(true);
      expect(can(role, "me.read")).toBe(true);
    }
  });

  it("names only known roles", () => {
    for (const roles of Object.values(PERMISSIONS)) {
      for (const role of roles) expect(ROLES).toContain(role);
    }
  });

  it("shows athletes no coach pages in their navigation", () => {
    expect(navFor("athlete").some((item) => item.href.startsWith("/coach"))).toBe(false);
    expect(navFor("coach").some((item) => item.href.startsWith("/coach"))).toBe(true);
  });
});
