import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { ZBlock, ZBlockListQuery, ZCreateBlock, ZUpdateBlock } from "@/lib/validation/blocks";
import {
  ZAssignment,
  ZAssignmentListQuery,
  ZCreateAssignment,
  ZCreatePlan,
  ZPlan,
  ZPlanListQuery,
  ZSquadAssignments,
  ZUpdatePlan,
} from "@/lib/validation/plans";
import { ZCreateSquad, ZSquad, ZSquadListQuery, ZSquadMembers, ZUpdateSquad } from "@/lib/validation/squads";
import { defineOperation, pageOf, zIdParam } from "../define";

/** Squads, blocks, plans and assignments. */
export function registerTrainingPaths(registry: OpenAPIRegistry): void {
  registerSquads(registry);
  registerBlocks(registry);
  registerPlans(registry);
  registerAssignments(registry);
}

function registerSquads(registry: OpenAPIRegistry) {
  const tag = "Squads";
  defineOperation(registry, { method: "get", path: "/api/v1/squads", tag, summary: "The team's squads by name, with members", query: ZSquadListQuery, ok: { status: 200, schema: pageOf(ZSquad) } });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/squads",
    tag,
    summary: "Create a squad, optionally with members (each must be an athlete of the team, else 422 naming `athleteIds.N`)",
    body: ZCreateSquad,
    ok: { status: 201, schema: ZSquad },
  });
  defineOperation(registry, { method: "get", path: "/api/v1/squads/{id}", tag, summary: "One squad with its members", params: zIdParam, ok: { status: 200, schema: ZSquad }, errors: [404] });
  defineOperation(registry, { method: "patch", path: "/api/v1/squads/{id}", tag, summary: "Rename or describe a squad", params: zIdParam, body: ZUpdateSquad, ok: { status: 200, schema: ZSquad }, errors: [404] });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/squads/{id}",
    tag,
    summary: "Delete a squad; assignments made through it stay with each athlete",
    params: zIdParam,
    ok: { status: 204, description: "Deleted" },
    errors: [404],
  });
  defineOperation(registry, {
    method: "put",
    path: "/api/v1/squads/{id}/members",
    tag,
    summary: "Replace the member list; 422 naming `athleteIds.N` when an id is not an athlete of the team (nothing changes)",
    params: zIdParam,
    body: ZSquadMembers,
    ok: { status: 200, schema: ZSquad },
    errors: [404],
  });
}

function registerBlocks(registry: OpenAPIRegistry) {
  const tag = "Blocks";
  const estimate =
    " `durationSec` and `warnings` read each ladder's first live rung (measure, standard value per set, tags).";
  defineOperation(registry, { method: "get", path: "/api/v1/blocks", tag, summary: `The team's blocks by name (\`archived=true\` for archived ones).${estimate}`, query: ZBlockListQuery, ok: { status: 200, schema: pageOf(ZBlock) } });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/blocks",
    tag,
    summary: `Create a block of 2–6 slots, each pointing at a ladder of the team (else 422 naming \`slots.N.ladderId\`).${estimate}`,
    body: ZCreateBlock,
    ok: { status: 201, schema: ZBlock },
  });
  defineOperation(registry, { method: "get", path: "/api/v1/blocks/{id}", tag, summary: `One block with its estimate and pairing warnings.${estimate}`, params: zIdParam, ok: { status: 200, schema: ZBlock }, errors: [404] });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/blocks/{id}",
    tag,
    summary: "Change a block; `slots`, when sent, replaces the slot list in order",
    params: zIdParam,
    body: ZUpdateBlock,
    ok: { status: 200, schema: ZBlock },
    errors: [404],
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/blocks/{id}",
    tag,
    summary: "Remove a block: archived when any plan uses it (the plans keep it), deleted otherwise; 204 either way",
    params: zIdParam,
    ok: { status: 204, description: "Archived or deleted" },
    errors: [404],
  });
}

function registerPlans(registry: OpenAPIRegistry) {
  const tag = "Plans";
  defineOperation(registry, { method: "get", path: "/api/v1/plans", tag, summary: "The team's plans by name, each day with its estimated duration", query: ZPlanListQuery, ok: { status: 200, schema: pageOf(ZPlan) } });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/plans",
    tag,
    summary: "Create a plan: weeks and blocks per ISO weekday (unknown or archived blocks: 422 naming `days.N.blockIds.M`)",
    body: ZCreatePlan,
    ok: { status: 201, schema: ZPlan },
  });
  defineOperation(registry, { method: "get", path: "/api/v1/plans/{id}", tag, summary: "One plan", params: zIdParam, ok: { status: 200, schema: ZPlan }, errors: [404] });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/plans/{id}",
    tag,
    summary: "Change a plan; `days`, when sent, replaces the week",
    params: zIdParam,
    body: ZUpdatePlan,
    ok: { status: 200, schema: ZPlan },
    errors: [404],
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/plans/{id}",
    tag,
    summary: "Remove a plan: archived when it was ever assigned (assignments keep running), deleted otherwise; 204 either way",
    params: zIdParam,
    ok: { status: 204, description: "Archived or deleted" },
    errors: [404],
  });
}

function registerAssignments(registry: OpenAPIRegistry) {
  const tag = "Assignments";
  const placement =
    " Places the athlete on the first live rung of each ladder the plan uses where they have no position yet (since the later of startsOn and today); existing positions are untouched. One transaction.";
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/assignments",
    tag,
    summary: "An athlete's assignments, latest start first (athletes may read their own)",
    params: zIdParam,
    query: ZAssignmentListQuery,
    ok: { status: 200, schema: pageOf(ZAssignment) },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/athletes/{id}/assignments",
    tag,
    summary: `Assign a plan to one athlete.${placement}`,
    params: zIdParam,
    body: ZCreateAssignment,
    ok: { status: 201, schema: ZAssignment },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/squads/{id}/assignments",
    tag,
    summary: `Assign a plan to every current member of a squad: one assignment per member.${placement}`,
    params: zIdParam,
    body: ZCreateAssignment,
    ok: { status: 201, schema: ZSquadAssignments },
    errors: [404],
  });
}
