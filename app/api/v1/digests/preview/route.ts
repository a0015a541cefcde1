import { route } from "@/lib/server/http/route";
import { previewDigest } from "@/lib/server/notifications/preview-digest";
import { ZDigestPreview } from "@/lib/validation/notifications";

export const POST = route({ can: "digests.preview", body: ZDigestPreview }, ({ actor, body }) => previewDigest(actor, body.week));
