import { route } from "@/lib/server/http/route";
import { createUpload } from "@/lib/server/uploads/create-upload";
import { ZCreateUpload } from "@/lib/validation/form-checks";

export const POST = route({ can: "uploads.write", body: ZCreateUpload, status: 201 }, ({ actor, body }) =>
  createUpload(actor, body),
);
