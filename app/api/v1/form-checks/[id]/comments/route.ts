import { addComment } from "@/lib/server/form-checks/add-comment";
import { route } from "@/lib/server/http/route";
import { ZCreateComment } from "@/lib/validation/form-checks";

export const POST = route({ can: "formChecks.comment", body: ZCreateComment, status: 201 }, ({ actor, params, body }) =>
  addComment(actor, params.id!, body),
);
