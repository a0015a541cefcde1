import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Notification operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerNotificationPaths(_registry: OpenAPIRegistry): void {}
