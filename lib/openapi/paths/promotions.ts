import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Promotion operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerPromotionPaths(_registry: OpenAPIRegistry): void {}
