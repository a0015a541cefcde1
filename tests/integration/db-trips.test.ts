import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db, type Db } from "@/db/client";
import { oneTrip, transactionInTrips } from "@/db/one-trip";
import { preparedOnce } from "@/db/prepared";
import { idempotencyKeys } from "@/db/schema";
import { lockPlacedRungs } from "@/lib/server/logs/log-rungs";
import { createMember, createTeam } from "../support/factories";
import { newKey, placeOn } from "../support/logging-factories";

const keyRow = preparedOnce((database: Db) =>
  database
    .insert(idempotencyKeys)
    .values({ ownerId: sql.placeholder("ownerId"), scope: "test", key: sql.placeholder("key"), requestHash: "h" })
    .returning({ id: idempotencyKeys.id })
    .prepare("test_insert_key_row"),
);

async function keyExists(key: string): Promise<boolean> {
  return (await db.select({ id: idempotencyKeys.id }).from(idempotencyKeys).where(eq(idempotencyKeys.key, key))).length === 1;
}

describe("transactions in few trips", () => {
  it("runs every statement of the work, and the last ones, inside one transaction that commits", async () => {
    const { owner } = await createTeam();
    const [first, last] = [newKey(), newKey()];
    const seen = await transactionInTrips(async (tx) => {
      // A statement sent with BEGIN, then one that reads it back in the same trip: order is kept.
      const [, [row]] = await oneTrip(tx, () => [
        keyRow(tx).execute({ ownerId: owner.userId, key: first }),
        tx.select({ key: idempotencyKeys.key }).from(idempotencyKeys).where(eq(idempotencyKeys.key, first)).execute(),
      ] as const);
      return { value: row?.key, last: () => [keyRow(tx).execute({ ownerId: owner.userId, key: last })] };
    });
    expect(seen).toBe(first);
    expect(await keyExists(first)).toBe(true);
    expect(await keyExists(last)).toBe(true);
  });

  it("rolls everything back when the work fails after writing, prepared statements included", async () => {
    const { owner } = await createTeam();
    const key = newKey();
    await expect(
      transactionInTrips(async (tx) => {
        await oneTrip(tx, () => [keyRow(tx).execute({ ownerId: owner.userId, key })] as const);
        // Seen inside the transaction: the statement ran on its connection, not on another of the pool.
        expect(await keyExists(key)).toBe(false);
        expect(await tx.select().from(idempotencyKeys).where(eq(idempotencyKeys.key, key))).toHaveLength(1);
        throw new Error("the work failed");
      }),
    ).rejects.toThrow("the work failed");
    expect(await keyExists(key)).toBe(false);
  });

  it("rolls back when one of the last statements fails, although COMMIT went out with them", async () => {
    const { owner } = await createTeam();
    const [kept, duplicate] = [newKey(), newKey()];
    await db.insert(idempotencyKeys).values({ ownerId: owner.userId, scope: "test", key: duplicate, requestHash: "h" });
    await expect(
      transactionInTrips(async (tx) => {
        await keyRow(tx).execute({ ownerId: owner.userId, key: kept });
        // (owner, scope, key) is unique: this insert fails, and PostgreSQL turns the COMMIT into a rollback.
        return { value: null, last: () => [keyRow(tx).execute({ ownerId: owner.userId, key: duplicate })] };
      }),
    ).rejects.toThrow();
    expect(await keyExists(kept)).toBe(false);
  });

  it("rolls back instead of committing when a last statement fails before it is sent", async () => {
    const { owner } = await createTeam();
    const [kept, unsent] = [newKey(), newKey()];
    await expect(
      transactionInTrips(async (tx) => {
        await keyRow(tx).execute({ ownerId: owner.userId, key: kept });
        // No value for the "key" placeholder: Drizzle rejects before anything reaches the wire.
        return { value: null, last: () => [keyRow(tx).execute({ ownerId: owner.userId, key: unsent }), keyRow(tx).execute({ ownerId: owner.userId })] };
      }),
    ).rejects.toThrow(/placeholder/i);
    expect(await keyExists(kept)).toBe(false);
    expect(await keyExists(unsent)).toBe(false);
  });

  it("skips the position locks at once while another transaction holds the Idempotency-Key", async () => {
    const { teamId } = await createTeam();
    const { actor } = await createMember(teamId, "athlete", "Trip Athlete");
    const rung = await placeOn(teamId, actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const keyName = newKey();
    const lockKey = `${actor.userId}\ntest\n${keyName}`;
    const key = { lockKey, keyOwner: actor.userId, keyScope: "test", keyName };
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    let holding!: () => void;
    const isHolding = new Promise<void>((resolve) => (holding = resolve));
    // The first request: holds the key's lock and the athlete's position until released.
    const first = db.transaction(async (tx) => {
      await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${lockKey}, 0))`);
      expect((await lockPlacedRungs(tx, teamId, actor.athleteId!, [rung.rungId], key)).size).toBe(1);
      holding();
      await held;
    });
    await isHolding;
    // The second: returns nothing instead of waiting for the first one's row lock (this would hang).
    const second = await db.transaction((tx) => lockPlacedRungs(tx, teamId, actor.athleteId!, [rung.rungId], key));
    expect(second.size).toBe(0);
    release();
    await first;
    // Without a key, the same read finds and locks the rung's position.
    const plain = await db.transaction((tx) => lockPlacedRungs(tx, teamId, actor.athleteId!, [rung.rungId]));
    expect(plain.get(rung.rungId)?.isCurrent).toBe(true);
  });

  it("locks nothing for a replay: a key with its answer stored", async () => {
    const { teamId } = await createTeam();
    const { actor } = await createMember(teamId, "athlete", "Replay Athlete");
    const rung = await placeOn(teamId, actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const keyName = newKey();
    const key = { lockKey: `${actor.userId}\ntest\n${keyName}`, keyOwner: actor.userId, keyScope: "test", keyName };
    const read = () => db.transaction((tx) => lockPlacedRungs(tx, teamId, actor.athleteId!, [rung.rungId], key));
    // Claimed but not answered (the request's own claim, sent just before its read): locked and read.
    const [row] = await db.insert(idempotencyKeys).values({ ownerId: actor.userId, scope: "test", key: keyName, requestHash: "h" }).returning();
    expect((await read()).size).toBe(1);
    // Answered: a replay reads the stored answer and takes no lock on the athlete's positions.
    await db.update(idempotencyKeys).set({ state: "done", responseStatus: 201 }).where(eq(idempotencyKeys.id, row!.id));
    expect((await read()).size).toBe(0);
  });
});
