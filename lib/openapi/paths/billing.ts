import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Billing operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerBillingPaths(_registry: OpenAPIRegistry): void {}
