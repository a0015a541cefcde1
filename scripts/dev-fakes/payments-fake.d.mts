// Types for the development payments fake (plain JavaScript so `npm start` runs it without tsx).
export interface FakeDelivery {
  event: { id: string; type: string; data: { object: Record<string, unknown> } };
  payload: string;
  header: string;
}

export interface FakeSubscription {
  id: string;
  status: string;
  cancel_at_period_end: boolean;
  items: { data: { current_period_end: number }[] };
}

export interface PaymentsFake {
  port: number;
  url: string;
  outbox: FakeDelivery[];
  subscriptions: Map<string, FakeSubscription>;
  close(): Promise<void>;
}

export function signPayload(payload: string, secret: string, t: number): string;
export function parseForm(body: string): Record<string, unknown>;
export function startPaymentsFake(options: {
  port?: number;
  host?: string;
  webhookUrl?: string;
  webhookSecret: string;
  deliver?: "post" | "hold";
  publicUrl?: string;
}): Promise<PaymentsFake>;
