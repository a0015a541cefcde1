import type { Metadata } from "next";
import Link from "next/link";
import { BlockEditor } from "@/components/blocks/block-editor";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { listLadderChoices } from "@/lib/server/blocks/list-ladder-choices";

export const metadata: Metadata = { title: "New block" };

export default async function NewBlockPage() {
  const actor = await requirePageActor("staff");
  const ladders = await listLadderChoices(actor);
  return (
    <>
      <Link href="/coach/blocks" className="text-sm font-semibold text-moss hover:underline">
        ← All blocks
      </Link>
      <PageHeader title="New block" lead="Pick the ladders in the order athletes rotate through them." />
      <BlockEditor block={null} ladders={ladders} />
    </>
  );
}
