import { OpenAPIRegistry, OpenApiGeneratorV31 } from "@asteasolutions/zod-to-openapi";
import { registerAccountPaths } from "./paths/account";
import { registerAthletePaths } from "./paths/athletes";
import { registerBillingPaths } from "./paths/billing";
import { registerFormCheckPaths } from "./paths/form-checks";
import { registerLadderPaths } from "./paths/ladders";
import { registerLogPaths } from "./paths/logs";
import { registerNotificationPaths } from "./paths/notifications";
import { registerPromotionPaths } from "./paths/promotions";
import { registerReadinessPaths } from "./paths/readiness";
import { registerTrainingPaths } from "./paths/training";

/** Domains add their operations in ./paths, one register function per file. */
const REGISTRARS = [
  registerAccountPaths,
  registerAthletePaths,
  registerLadderPaths,
  registerTrainingPaths,
  registerLogPaths,
  registerPromotionPaths,
  registerReadinessPaths,
  registerNotificationPaths,
  registerFormCheckPaths,
  registerBillingPaths,
];

let cached: object | undefined;

/** The OpenAPI 3.1 document for /api/v1, generated from the same zod schemas the handlers use. */
export function openApiDocument(): object {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  registry.registerComponent("securitySchemes", "bearer", {
    type: "http",
    scheme: "bearer",
    description: "A personal API token from Settings → API tokens.",
  });
  registry.registerComponent("securitySchemes", "session", {
    type: "apiKey",
    in: "cookie",
    name: "authjs.session-token",
    description: "The web app's session cookie.",
  });
  for (const register of REGISTRARS) register(registry);
  cached = new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: {
      title: "Rungwise API",
      version: "1.0.0",
      description:
        "Ladders, readiness standards, plans, logs and verdicts for skill coaches and their athletes. " +
        "Lists answer { items, nextCursor }; errors answer { error: { code, message, issues? } }.",
    },
    servers: [{ url: "/" }],
  });
  return cached;
}
