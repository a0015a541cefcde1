import { z } from "zod";
import { noNul, NUL_MESSAGE, zEmail, zName, zPassword, zTimeZone } from "./common";

export const ZSignUp = z.strictObject({
  email: zEmail,
  password: zPassword,
  name: zName,
  teamName: zName,
  timeZone: zTimeZone,
});
export type SignUpInput = z.infer<typeof ZSignUp>;

export const ZSignIn = z.object({
  email: zEmail,
  password: z.string().min(1, "Enter your password.").max(200),
});
export type SignInInput = z.infer<typeof ZSignIn>;

export const ZAcceptInvite = z.strictObject({
  name: zName,
  password: zPassword,
});
export type AcceptInviteInput = z.infer<typeof ZAcceptInvite>;

export const ZPasswordResetRequest = z.strictObject({ email: zEmail });
export const ZPasswordReset = z.strictObject({ password: zPassword });

export const ZCreateToken = z.strictObject({
  name: z.string().trim().min(1, "Name the token after what uses it.").max(80).refine(noNul, NUL_MESSAGE),
});
export type CreateTokenInput = z.infer<typeof ZCreateToken>;

export const ZInviteCoach = z.strictObject({ email: zEmail });
