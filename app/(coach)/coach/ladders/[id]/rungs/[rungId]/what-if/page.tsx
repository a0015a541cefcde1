import type { Metadata } from "next";
import { WhatIfForm } from "@/components/ladders/what-if-form";
import { NotFound } from "@/lib/errors";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { orNotFound } from "@/lib/server/http/page-errors";
import { getRungStandard } from "@/lib/server/promotions/get-rung-standard";

export const metadata: Metadata = { title: "What if" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function WhatIfPage({ params }: { params: Promise<{ id: string; rungId: string }> }) {
  const { id, rungId } = await params;
  const actor = await requirePageActor("staff");
  const found = UUID.test(id) && UUID.test(rungId) ? getRungStandard(actor, id, rungId) : Promise.reject(new NotFound("rung"));
  const rung = await orNotFound(found);
  return (
    <>
      <PageHeader
        title={`What if: ${rung.rungName}`}
        lead={`${rung.ladderName}. Change the standard and see when everyone who has been on this rung would have moved up. Nothing is saved.`}
      />
      <WhatIfForm ladderId={id} rungId={rungId} measure={rung.measure} current={rung.standard} />
    </>
  );
}
