import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Readiness operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerReadinessPaths(_registry: OpenAPIRegistry): void {}
