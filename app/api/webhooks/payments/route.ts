import { NextResponse, type NextRequest } from "next/server";
import { PayloadTooLarge } from "@/lib/errors";
import { handlePaymentWebhook } from "@/lib/server/billing/handle-payment-webhook";
import { errorResponse } from "@/lib/server/http/error-response";

const MAX_BYTES = 512 * 1024;

/** The payment provider's webhooks: no session, the signature is the identity (400 when it fails). */
export async function POST(request: NextRequest): Promise<Response> {
  try {
    // The raw text, byte for byte: the signature covers exactly what was sent.
    const body = await request.text();
    if (Buffer.byteLength(body) > MAX_BYTES) throw new PayloadTooLarge("Webhook body too large.");
    return NextResponse.json(await handlePaymentWebhook(body, request.headers.get("stripe-signature")));
  } catch (error) {
    return errorResponse(error);
  }
}
