import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Training operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerTrainingPaths(_registry: OpenAPIRegistry): void {}
