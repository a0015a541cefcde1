import { addDays, localDateOf } from "@/lib/engine";
import { assignPlan } from "@/lib/server/assignments/assign-plan";
import type { Actor } from "@/lib/server/actor";
import type { Tx } from "../../client";
import { blockSlots, blocks, planDayBlocks, plans, squadMembers, squads } from "../../schema";
import { DEMO_CLUB, DEMO_OWNER, type DemoAthleteKey } from "../demo-cast";
import { demoTeam } from "../demo-team";
import type { SeedStep } from "../step";

const SQUADS: { name: string; description: string; members: DemoAthleteKey[] }[] = [
  { name: "Early-evening balance", description: "Handstand and press work, Monday, Wednesday and Friday at 18:00.", members: ["priya", "amara", "ines", "hugo", "lotte"] },
  { name: "Pulling and rings", description: "Rings, levers and pulling on the off days.", members: ["priya", "jonas", "felix", "sol"] },
];

type BlockKey = "balance" | "rings" | "light";
const BLOCKS: Record<BlockKey, { name: string; rounds: number; slotRest: number; roundRest: number; notes: string; slots: { ladder: string; sets?: number; target?: string; note?: string }[] }> = {
  balance: {
    name: "Balance and press",
    rounds: 3,
    slotRest: 60,
    roundRest: 120,
    notes: "Warm the wrists first. A wall or a spotter for every new inversion.",
    slots: [
      { ladder: "freestanding-handstand", target: "Quality over seconds", note: "Stop on sharp wrist pain." },
      { ladder: "press-to-handstand" },
      { ladder: "l-sit-to-v-sit", sets: 2 },
    ],
  },
  rings: {
    name: "Rings and lever pull",
    rounds: 3,
    slotRest: 75,
    roundRest: 120,
    notes: "Straps at hip height to start; chalk if the grip slips.",
    slots: [
      { ladder: "ring-muscle-up", note: "Elbows in on every transition." },
      { ladder: "front-lever", target: "Smooth holds, no shaking" },
    ],
  },
  light: {
    name: "Light skill practice",
    rounds: 2,
    slotRest: 45,
    roundRest: 90,
    notes: "Easy day: leave two or three reps in the tank.",
    slots: [{ ladder: "handstand-push-up", sets: 2 }, { ladder: "front-lever", sets: 2 }],
  },
};

async function insertBlock(tx: Tx, teamId: string, ladderIds: Record<string, string>, key: BlockKey) {
  const spec = BLOCKS[key];
  const [row] = await tx
    .insert(blocks)
    .values({ teamId, name: spec.name, rounds: spec.rounds, restBetweenSlotsSec: spec.slotRest, restBetweenRoundsSec: spec.roundRest, notes: spec.notes })
    .returning({ id: blocks.id });
  await tx.insert(blockSlots).values(
    spec.slots.map((slot, index) => ({
      teamId,
      blockId: row!.id,
      position: index + 1,
      ladderId: ladderIds[slot.ladder]!,
      sets: slot.sets ?? null,
      target: slot.target ?? null,
      note: slot.note ?? null,
    })),
  );
  return row!.id;
}

async function insertPlan(tx: Tx, teamId: string, plan: { name: string; weeks: number; warmUp: string; coolDown: string; days: [number, string[]][] }) {
  const [row] = await tx.insert(plans).values({ teamId, name: plan.name, weeks: plan.weeks, warmUp: plan.warmUp, coolDown: plan.coolDown }).returning({ id: plans.id });
  await tx.insert(planDayBlocks).values(
    plan.days.flatMap(([weekday, blockIds]) => blockIds.map((blockId, index) => ({ teamId, planId: row!.id, weekday, position: index + 1, blockId }))),
  );
  return row!.id;
}

/**
 * Two squads, three blocks on the starter ladders, and two plans that together cover every weekday
 * for Priya (the athlete demo sign-in), so the Today page always has something planned: the
 * three-day "Foundations 6 weeks" for everyone, and light off-day practice for the rings squad.
 * Both started three weeks before the seed ran (team-local date).
 */
export const squadsAndPlans: SeedStep = {
  name: "003-squads-and-plans",
  async run(tx, { now }) {
    const team = await demoTeam(tx);
    const today = localDateOf(now, DEMO_CLUB.timeZone);
    const startsOn = addDays(today, -21);
    const actor: Actor = { userId: team.ownerId, teamId: team.teamId, role: "owner", athleteId: null, name: "Demo seed", email: DEMO_OWNER.email, timeZone: DEMO_CLUB.timeZone };

    const squadIds: string[] = [];
    for (const squad of SQUADS) {
      const [row] = await tx.insert(squads).values({ teamId: team.teamId, name: squad.name, description: squad.description }).returning({ id: squads.id });
      await tx.insert(squadMembers).values(squad.members.map((key) => ({ teamId: team.teamId, squadId: row!.id, athleteId: team.athleteIds[key] })));
      squadIds.push(row!.id);
    }

    const balance = await insertBlock(tx, team.teamId, team.ladderIds, "balance");
    const rings = await insertBlock(tx, team.teamId, team.ladderIds, "rings");
    const light = await insertBlock(tx, team.teamId, team.ladderIds, "light");
    const foundations = await insertPlan(tx, team.teamId, {
      name: "Foundations 6 weeks",
      weeks: 6,
      warmUp: "Five minutes easy: wrist circles and rocks, scapula push-ups, hollow and arch rocks.",
      coolDown: "Forearm and shoulder stretches; note anything that hurt.",
      days: [
        [1, [balance, rings]],
        [3, [rings, balance]],
        [5, [balance, light]],
      ],
    });
    const offDays = await insertPlan(tx, team.teamId, {
      name: "Off-day skill practice",
      weeks: 6,
      warmUp: "Wrist prep and a few easy hangs.",
      coolDown: "Easy stretch.",
      days: [2, 4, 6, 7].map((weekday) => [weekday, [light]] as [number, string[]]),
    });

    const balanceSquad = squadIds[0]!;
    const ringsSquad = squadIds[1]!;
    const memberIds = (index: number) => SQUADS[index]!.members.map((key) => team.athleteIds[key]);
    await assignPlan(tx, actor, memberIds(0), { planId: foundations, startsOn }, balanceSquad, today);
    const others = (["jonas", "felix", "sol"] as const).map((key) => team.athleteIds[key]);
    await assignPlan(tx, actor, others, { planId: foundations, startsOn }, null, today);
    await assignPlan(tx, actor, memberIds(1), { planId: offDays, startsOn }, ringsSquad, today);
  },
};
