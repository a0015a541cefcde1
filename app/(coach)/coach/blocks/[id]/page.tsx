import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { BlockEditor } from "@/components/blocks/block-editor";
import { Badge, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { getBlock } from "@/lib/server/blocks/get-block";
import { listLadderChoices } from "@/lib/server/blocks/list-ladder-choices";
import { orNotFound } from "@/lib/server/http/page-errors";
import { zId } from "@/lib/validation/common";

export const metadata: Metadata = { title: "Block" };

export default async function BlockPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  if (!zId.safeParse(id).success) notFound();
  const actor = await requirePageActor("staff");
  const [block, ladders] = await Promise.all([orNotFound(getBlock(actor, id)), listLadderChoices(actor)]);
  return (
    <>
      <Link href="/coach/blocks" className="text-sm font-semibold text-moss hover:underline">
        ← All blocks
      </Link>
      <PageHeader title={block.name} lead={block.archived ? <Badge tone="ember">Archived: plans that use it keep it</Badge> : undefined} />
      <BlockEditor key={block.updatedAt} block={block} ladders={ladders} />
    </>
  );
}
