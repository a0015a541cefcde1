import { signUp } from "@/lib/server/auth/sign-up";
import { publicRoute } from "@/lib/server/http/route";
import { ZSignUp } from "@/lib/validation/auth";

export const POST = publicRoute({ body: ZSignUp, status: 201 }, ({ body }) => signUp(body));
