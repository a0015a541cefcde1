import { createBlock } from "@/lib/server/blocks/create-block";
import { listBlocks } from "@/lib/server/blocks/list-blocks";
import { route } from "@/lib/server/http/route";
import { ZBlockListQuery, ZCreateBlock } from "@/lib/validation/blocks";

export const GET = route({ can: "blocks.read", query: ZBlockListQuery }, ({ actor, query }) => listBlocks(actor, query));

export const POST = route({ can: "blocks.write", body: ZCreateBlock, status: 201 }, ({ actor, body }) => createBlock(actor, body));
