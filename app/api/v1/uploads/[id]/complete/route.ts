import { route } from "@/lib/server/http/route";
import { completeUpload } from "@/lib/server/uploads/complete-upload";

export const POST = route({ can: "uploads.write" }, ({ actor, params }) => completeUpload(actor, params.id!));
