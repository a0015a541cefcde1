import { z } from "zod";

/**
 * Every setting the app reads, validated once. A missing or malformed value stops start-up with a
 * message that names it, instead of failing later inside a request.
 */
export const ZEnv = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/, error: "DATABASE_URL must be a postgres:// URL" }),
  // Unset: twice the cores plus one (db/client.ts, defaultPoolSize).
  DATABASE_POOL_SIZE: z.coerce.number().int().min(1).max(200).optional(),
  AUTH_SECRET: z.string().min(32, "AUTH_SECRET must be at least 32 characters"),
  APP_URL: z.url({ protocol: /^https?$/, error: "APP_URL must be the absolute URL people open, e.g. http://localhost:3000" }),
  PASSWORD_HASH_COST: z.coerce.number().int().min(4).max(15).default(12),
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(1025),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: z.stringbool().default(false),
  MAIL_FROM: z.string().min(3).default("Rungwise <no-reply@rungwise.test>"),
  // Payments: billing is off while STRIPE_SECRET_KEY is unset. PAYMENTS_API_* point the SDK at the
  // local development fake; leave them unset for the provider's real API.
  STRIPE_SECRET_KEY: z.string().min(8).optional(),
  STRIPE_WEBHOOK_SECRET: z.string().min(8).optional(),
  PAYMENTS_API_HOST: z.string().min(1).optional(),
  PAYMENTS_API_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  PAYMENTS_API_PROTOCOL: z.enum(["http", "https"]).optional(),
});

export type Env = z.infer<typeof ZEnv>;

export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = ZEnv.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  - ${i.path.join(".") || "(env)"}: ${i.message}`);
    throw new Error(`Invalid environment configuration:\n${lines.join("\n")}`);
  }
  return result.data;
}

let cached: Env | undefined;

/** The validated environment, parsed on first use (the instrumentation hook calls it at start-up). */
export function env(): Env {
  cached ??= parseEnv(process.env);
  return cached;
}

/**
 * S3-compatible storage and upload limits for form checks, validated on first use. Kept as its own
 * schema so a missing bucket setting never blocks the rest of the app from starting; the defaults
 * match the local fake that `npm start` runs.
 */
export const ZStorageEnv = z.object({
  S3_ENDPOINT: z.url({ protocol: /^https?$/, error: "S3_ENDPOINT must be an http(s) URL" }).default("http://127.0.0.1:4569"),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_BUCKET: z.string().min(3).max(63).default("rungwise"),
  S3_ACCESS_KEY_ID: z.string().min(1).default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().min(1).default("S3RVER"),
  S3_FORCE_PATH_STYLE: z.stringbool().default(true),
  /** Largest video and image a form check accepts, in bytes (200 MB and 15 MB). */
  UPLOAD_MAX_VIDEO_BYTES: z.coerce.number().int().min(1).default(200 * 1024 * 1024),
  UPLOAD_MAX_IMAGE_BYTES: z.coerce.number().int().min(1).default(15 * 1024 * 1024),
  /** Storage each athlete may fill with form checks, in bytes (2 GB). */
  UPLOAD_ATHLETE_QUOTA_BYTES: z.coerce.number().int().min(1).default(2 * 1024 * 1024 * 1024),
});

export type StorageEnv = z.infer<typeof ZStorageEnv>;

export function parseStorageEnv(source: Record<string, string | undefined>): StorageEnv {
  const result = ZStorageEnv.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  - ${i.path.join(".") || "(env)"}: ${i.message}`);
    throw new Error(`Invalid storage configuration:\n${lines.join("\n")}`);
  }
  return result.data;
}

let cachedStorage: StorageEnv | undefined;

export function storageEnv(): StorageEnv {
  cachedStorage ??= parseStorageEnv(process.env);
  return cachedStorage;
}
