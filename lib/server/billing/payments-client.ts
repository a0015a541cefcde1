import "server-only";
import Stripe from "stripe";
import { Conflict, ServiceUnavailable } from "@/lib/errors";
import { paymentsConfig, type PaymentsConfig } from "./payments-config";

/** Pinned with the `stripe` package (23.1.0): objects are read in this version's shape. */
export const PAYMENTS_API_VERSION = "2026-10-28.endive" as const;

let cached: { key: string; client: Stripe } | undefined;

function clientFor(config: PaymentsConfig): Stripe {
  const key = [config.secretKey, config.host, config.port, config.protocol].join("|");
  if (cached?.key === key) return cached.client;
  const client = new Stripe(config.secretKey, {
    apiVersion: PAYMENTS_API_VERSION,
    host: config.host,
    port: config.port,
    protocol: config.protocol,
    maxNetworkRetries: 1,
    timeout: 10_000,
  });
  cached = { key, client };
  return client;
}

/** The SDK client, or 409 when this server has no payment settings. */
export function paymentsClient(): Stripe {
  const config = paymentsConfig();
  if (!config) throw new Conflict("Payments are not set up on this server.");
  return clientFor(config);
}

/**
 * Runs a call to the provider, turning an outage (no connection, its own server error, rate limit)
 * into a 503 the caller can retry, instead of an unexplained 500. Other provider errors are our
 * bugs and stay errors.
 */
export async function callProvider<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (
      error instanceof Stripe.errors.StripeConnectionError ||
      error instanceof Stripe.errors.StripeAPIError ||
      error instanceof Stripe.errors.StripeRateLimitError
    ) {
      throw new ServiceUnavailable("The payment provider did not answer. Nothing was charged or changed; try again in a minute.");
    }
    throw error;
  }
}
