import "server-only";
import { ZEnv } from "@/lib/env";

const ZPaymentsEnv = ZEnv.pick({
  STRIPE_SECRET_KEY: true,
  STRIPE_WEBHOOK_SECRET: true,
  PAYMENTS_API_HOST: true,
  PAYMENTS_API_PORT: true,
  PAYMENTS_API_PROTOCOL: true,
});

export interface PaymentsConfig {
  secretKey: string;
  webhookSecret: string | null;
  host?: string;
  port?: number;
  protocol?: "http" | "https";
  /** True against the local development fake or with a provider test key. */
  testMode: boolean;
}

/**
 * The payment settings, read on each call (cheap) so tests can point them at their own fake. Null
 * when no secret key is set: billing is off and nothing is gated.
 */
export function paymentsConfig(): PaymentsConfig | null {
  const parsed = ZPaymentsEnv.parse(process.env);
  if (!parsed.STRIPE_SECRET_KEY) return null;
  return {
    secretKey: parsed.STRIPE_SECRET_KEY,
    webhookSecret: parsed.STRIPE_WEBHOOK_SECRET ?? null,
    host: parsed.PAYMENTS_API_HOST,
    port: parsed.PAYMENTS_API_PORT,
    protocol: parsed.PAYMENTS_API_PROTOCOL,
    testMode: Boolean(parsed.PAYMENTS_API_HOST) || parsed.STRIPE_SECRET_KEY.startsWith("sk_test_"),
  };
}
