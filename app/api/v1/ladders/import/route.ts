import { route } from "@/lib/server/http/route";
import { importLadder } from "@/lib/server/ladders/import-ladder";
import { ZLadderDocument } from "@/lib/validation/ladder-document";

export const POST = route({ can: "ladders.write", body: ZLadderDocument, status: 201, maxBodyBytes: 1024 * 1024 }, ({ actor, body }) =>
  importLadder(actor, body),
);
