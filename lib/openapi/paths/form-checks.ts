import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** FormCheck operations: add one defineOperation(...) per route (see ./athletes.ts). */
export function registerFormCheckPaths(_registry: OpenAPIRegistry): void {}
