import { describe, expect, it } from "vitest";
import { parseEnv } from "@/lib/env";

const valid = {
  DATABASE_URL: "postgres://u:p@127.0.0.1:5433/rungwise",
  AUTH_SECRET: "x".repeat(32),
  APP_URL: "http://localhost:3000",
};

describe("environment validation", () => {
  it("accepts a complete configuration and fills defaults", () => {
    const env = parseEnv(valid);
    expect(env.SMTP_PORT).toBe(1025);
    expect(env.PASSWORD_HASH_COST).toBe(12);
    expect(env.SMTP_SECURE).toBe(false);
  });

  it("coerces numbers and booleans from strings", () => {
    const env = parseEnv({ ...valid, SMTP_PORT: "2525", SMTP_SECURE: "true", PASSWORD_HASH_COST: "10" });
    expect(env.SMTP_PORT).toBe(2525);
    expect(env.SMTP_SECURE).toBe(true);
    expect(env.PASSWORD_HASH_COST).toBe(10);
  });

  it.each([
    ["DATABASE_URL", undefined],
    ["DATABASE_URL", "mysql://u@h/db"],
    ["AUTH_SECRET", "too-short"],
    ["APP_URL", "localhost:3000"],
  ])("names %s when it is %s", (key, value) => {
    expect(() => parseEnv({ ...valid, [key]: value })).toThrow(key);
  });

  it("rejects an out-of-range port", () => {
    expect(() => parseEnv({ ...valid, SMTP_PORT: "70000" })).toThrow("SMTP_PORT");
  });
});
