import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Log operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerLogPaths(_registry: OpenAPIRegistry): void {}
