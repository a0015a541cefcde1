import { NextResponse } from "next/server";
import { route } from "@/lib/server/http/route";
import { exportLadder } from "@/lib/server/ladders/export-ladder";

/** The ladder as a `rungwise.ladder` document, offered as a download. */
export const GET = route({ can: "ladders.read" }, async ({ actor, params }) => {
  const doc = await exportLadder(actor, params.id!);
  const file = `${doc.ladder.name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "ladder"}.rungwise.json`;
  return NextResponse.json(doc, { headers: { "content-disposition": `attachment; filename="${file}"` } });
});
