import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Ladder operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerLadderPaths(_registry: OpenAPIRegistry): void {}
