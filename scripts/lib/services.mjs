// Backing services for `npm start` and `npm test`. Each service has a start function that returns
// the environment variables the app (and tests) need to reach it. To add one (e.g. a payment fake):
// write a start function below and append it to `services`; both scripts pick it up.
//
// ctx: { root, dataDir, mode: "start" | "test", ports, userEnv, state, appUrl }
//   ports     numbers chosen by the caller (fixed defaults for start, free ones for test)
//   userEnv   what the user exported; a service it already describes is not started
//   state     shared handles (state.cluster for the test script's extra databases)
import fs from "node:fs";
import path from "node:path";
import { info } from "./log.mjs";
import { isPortFree, waitForHttp, waitForPort } from "./ports.mjs";
import { PgCluster } from "./postgres.mjs";
import { spawnTracked } from "./proc.mjs";

export const APP_DB = { user: "rungwise", password: "rungwise", database: "rungwise" };
export const TEST_ADMIN = { user: "rungwise_test", password: "rungwise_test" };

const bin = (root, name) => path.join(root, "node_modules", ".bin", name);
const isLocalHost = (host) => ["127.0.0.1", "localhost", "::1"].includes(host);

async function requireFreePort(port, variable) {
  if (!(await isPortFree(port))) throw new Error(`Port ${port} is already in use; set ${variable} to another port.`);
}

/** PostgreSQL: the app database for `start`, a superuser URL for tests that create their own. */
async function startDatabase(ctx) {
  if (ctx.mode === "start" && ctx.userEnv.DATABASE_URL) {
    info("Using DATABASE_URL from the environment (no local PostgreSQL cluster).");
    return {};
  }
  const cluster = new PgCluster({ link: path.join(ctx.dataDir, "pg"), port: ctx.ports.pg, throwaway: ctx.mode === "test" });
  await cluster.prepare();
  await cluster.start();
  ctx.state.cluster = cluster;
  if (ctx.mode === "test") {
    await cluster.ensureRole(TEST_ADMIN.user, TEST_ADMIN.password, { superuser: true });
    await cluster.ensureRole(APP_DB.user, APP_DB.password);
    return {
      PGPORT: String(ctx.ports.pg),
      TEST_PG_ADMIN_URL: cluster.url(TEST_ADMIN.user, TEST_ADMIN.password, "postgres"),
    };
  }
  await cluster.ensureRole(APP_DB.user, APP_DB.password);
  await cluster.ensureDatabase(APP_DB.database, APP_DB.user);
  return {
    PGPORT: String(ctx.ports.pg),
    DATABASE_URL: cluster.url(APP_DB.user, APP_DB.password, APP_DB.database),
  };
}

/** maildev: catches every e-mail (SMTP) and shows it in a web UI with a REST API (GET /email). */
async function startMailCatcher(ctx) {
  const { userEnv } = ctx;
  const env = {
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(ctx.ports.smtp),
    MAIL_UI_PORT: String(ctx.ports.mailUi),
    MAIL_UI_URL: `http://127.0.0.1:${ctx.ports.mailUi}`,
    MAIL_FROM: "Rungwise <no-reply@rungwise.test>",
  };
  if (ctx.mode === "start" && userEnv.SMTP_HOST && !isLocalHost(userEnv.SMTP_HOST)) {
    info(`Sending mail through ${userEnv.SMTP_HOST} (no local mail catcher).`);
    return { MAIL_FROM: env.MAIL_FROM };
  }
  await requireFreePort(ctx.ports.smtp, "SMTP_PORT");
  await requireFreePort(ctx.ports.mailUi, "MAIL_UI_PORT");
  const mailDir = path.join(ctx.dataDir, "mail"); // kept across restarts for `start`
  fs.mkdirSync(mailDir, { recursive: true });
  const args = ["--smtp", env.SMTP_PORT, "--web", env.MAIL_UI_PORT, "--ip", "127.0.0.1", "--mail-directory", mailDir];
  if (ctx.mode === "test") args.push("--silent");
  const handle = spawnTracked("mail", bin(ctx.root, "maildev"), args, { cwd: ctx.root });
  let dead = false;
  handle.exited.then(() => (dead = true));
  const up =
    (await waitForPort(ctx.ports.smtp, { isDead: () => dead })) &&
    (await waitForHttp(`${env.MAIL_UI_URL}/email`, { timeoutMs: 30_000, ok: (s) => s === 200, isDead: () => dead }));
  if (!up) throw new Error(`the mail catcher did not start:\n${handle.output()}`);
  ctx.state.mail = handle;
  return env;
}

/** s3rver: S3-compatible storage for uploads (path-style; CORS open for local origins). */
async function startObjectStore(ctx) {
  const { userEnv } = ctx;
  const bucket = userEnv.S3_BUCKET ?? "rungwise";
  const env = {
    S3_ENDPOINT: `http://127.0.0.1:${ctx.ports.s3}`,
    S3_REGION: "us-east-1",
    S3_BUCKET: bucket,
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    S3_FORCE_PATH_STYLE: "true",
  };
  if (ctx.mode === "start" && userEnv.S3_ENDPOINT) {
    info(`Using object storage at ${userEnv.S3_ENDPOINT}.`);
    return {};
  }
  await requireFreePort(ctx.ports.s3, "S3_PORT");
  const storeDir = path.join(ctx.dataDir, "s3");
  fs.mkdirSync(storeDir, { recursive: true });
  const cors = path.join(ctx.dataDir, "s3-cors.xml");
  fs.writeFileSync(
    cors,
    `<CORSConfiguration><CORSRule><AllowedOrigin>*</AllowedOrigin><AllowedMethod>GET</AllowedMethod>` +
      `<AllowedMethod>PUT</AllowedMethod><AllowedMethod>HEAD</AllowedMethod><AllowedHeader>*</AllowedHeader>` +
      `<ExposeHeader>ETag</ExposeHeader><MaxAgeSeconds>3000</MaxAgeSeconds></CORSRule></CORSConfiguration>\n`,
  );
  const args = ["-d", storeDir, "-a", "127.0.0.1", "-p", String(ctx.ports.s3), "--configure-bucket", bucket, cors];
  if (ctx.mode === "test") args.push("--silent");
  const handle = spawnTracked("s3", bin(ctx.root, "s3rver"), args, { cwd: ctx.root });
  let dead = false;
  handle.exited.then(() => (dead = true));
  if (!(await waitForPort(ctx.ports.s3, { isDead: () => dead }))) {
    throw new Error(`the object store did not start:\n${handle.output()}`);
  }
  return env;
}

/**
 * DEVELOPMENT FAKE of the payment provider (scripts/dev-fakes/payments-fake.mjs): the app's `stripe`
 * SDK talks to it through PAYMENTS_API_HOST/PORT/PROTOCOL, and it posts signed webhooks to the app.
 * Skipped for `start` when the user set a real STRIPE_SECRET_KEY.
 */
async function startPaymentsFake(ctx) {
  const { userEnv } = ctx;
  if (ctx.mode === "start" && userEnv.STRIPE_SECRET_KEY && !userEnv.PAYMENTS_API_HOST) {
    info("Using the payment provider's real API (STRIPE_SECRET_KEY is set; no local fake).");
    return {};
  }
  const env = {
    PAYMENTS_API_HOST: "127.0.0.1",
    PAYMENTS_API_PORT: String(ctx.ports.payments),
    PAYMENTS_API_PROTOCOL: "http",
    STRIPE_SECRET_KEY: "sk_test_rungwise_fake_0000000000000000",
    STRIPE_WEBHOOK_SECRET: "whsec_rungwise_fake_0000000000000000",
    PAYMENTS_WEBHOOK_URL: `${ctx.appUrl}/api/webhooks/payments`,
  };
  await requireFreePort(ctx.ports.payments, "PAYMENTS_API_PORT");
  const handle = spawnTracked("payments", process.execPath, [path.join(ctx.root, "scripts/dev-fakes/payments-fake.mjs")], {
    cwd: ctx.root,
    env: { ...process.env, ...env },
  });
  let dead = false;
  handle.exited.then(() => (dead = true));
  const up = await waitForHttp(`http://127.0.0.1:${ctx.ports.payments}/health`, { timeoutMs: 15_000, ok: (s) => s === 200, isDead: () => dead });
  if (!up) throw new Error(`the payments fake did not start:\n${handle.output()}`);
  return env;
}

export const services = [
  { name: "PostgreSQL", start: startDatabase },
  { name: "mail catcher", start: startMailCatcher },
  { name: "object storage", start: startObjectStore },
  { name: "payments fake", start: startPaymentsFake },
];

/** Start every service in order; returns the combined environment they describe. */
export async function startServices(ctx) {
  const env = {};
  for (const service of services) Object.assign(env, await service.start(ctx));
  return env;
}
