import { route } from "@/lib/server/http/route";
import { createLadder } from "@/lib/server/ladders/create-ladder";
import { listLadders } from "@/lib/server/ladders/list-ladders";
import { ZCreateLadder, ZLadderListQuery } from "@/lib/validation/ladders";

export const GET = route({ can: "ladders.read", query: ZLadderListQuery }, ({ actor, query }) => listLadders(actor, query));

export const POST = route({ can: "ladders.write", body: ZCreateLadder, status: 201, maxBodyBytes: 1024 * 1024 }, ({ actor, body }) =>
  createLadder(actor, body),
);
