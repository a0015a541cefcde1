import type { NextRequest } from "next/server";
import { handlers } from "@/auth";
import { TooManyRequests } from "@/lib/errors";
import { clientIp, signInRetryAfter, throttleKey } from "@/lib/server/auth/sign-in-throttle";
import { errorResponse } from "@/lib/server/http/error-response";

export const GET = handlers.GET;

/** The credentials callback answers 429 with Retry-After once an e-mail + address is throttled. */
export async function POST(request: NextRequest) {
  if (request.nextUrl.pathname.endsWith("/callback/credentials")) {
    const form = await request.clone().formData().catch(() => null);
    const email = form?.get("email");
    if (typeof email === "string" && email) {
      const retryAfter = await signInRetryAfter(throttleKey(email, clientIp(request.headers)));
      if (retryAfter > 0) {
        return errorResponse(new TooManyRequests("Too many failed sign-ins. Try again later.", retryAfter));
      }
    }
  }
  return handlers.POST(request);
}
