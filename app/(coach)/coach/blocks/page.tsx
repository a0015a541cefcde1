import type { Metadata } from "next";
import Link from "next/link";
import { BlockList } from "@/components/blocks/block-list";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Blocks" };

export default async function BlocksPage() {
  await requirePageActor("staff");
  return (
    <>
      <PageHeader
        title="Blocks"
        lead="Supersets of 2 to 6 ladders done in rotation. Plans put blocks on weekdays."
        actions={
          <Link href="/coach/blocks/new" className={buttonClass()}>
            New block
          </Link>
        }
      />
      <BlockList />
    </>
  );
}
