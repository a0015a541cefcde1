// The errors PostgreSQL really raises, through Drizzle, reach the client as the caller's fault
// (SQLSTATE codes from the PostgreSQL documentation, appendix A "PostgreSQL Error Codes"):
// a foreign key violation (23503), either way round, is 409; a data exception (class 22) is 422.
import { randomUUID } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import { afterEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/client";
import { logs, rungs } from "@/db/schema";
import { errorResponse } from "@/lib/server/http/error-response";
import { createMember, createTeam } from "../support/factories";
import { placeOn } from "../support/logging-factories";

async function refusal(write: () => Promise<unknown>): Promise<unknown> {
  try {
    await write();
  } catch (error) {
    return error;
  }
  throw new Error("the write was expected to be refused");
}

describe("database refusals as HTTP answers", () => {
  afterEach(() => vi.restoreAllMocks());

  it("answers 409 when a row the write names is gone (a log for an athlete deleted meanwhile)", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => undefined);
    const { teamId } = await createTeam();
    const coach = await createMember(teamId, "coach", "Refused Coach");
    const error = await refusal(() =>
      db.insert(logs).values({ teamId, athleteId: randomUUID(), performedOn: "2026-01-05", enteredById: coach.actor.userId }),
    );
    const res = errorResponse(error);
    expect(res.status).toBe(409);
    expect((await res.json()).error.code).toBe("conflict");
  });

  it("answers 409 when a row the write deletes is in use (a rung an athlete stands on)", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => undefined);
    const { teamId } = await createTeam();
    const athlete = await createMember(teamId, "athlete", "Standing Athlete");
    const rung = await placeOn(teamId, athlete.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const error = await refusal(() => db.delete(rungs).where(eq(rungs.id, rung.rungId)));
    expect(errorResponse(error).status).toBe(409);
  });

  it("answers 422 for a value the database cannot store", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => undefined);
    const error = await refusal(() => db.execute(sql`select ${"not a date"}::date`));
    expect(errorResponse(error).status).toBe(422);
  });
});
