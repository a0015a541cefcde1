import type { Metadata } from "next";
import { ApprovalList } from "@/components/promotions/approval-list";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Approvals" };

export default async function ApprovalsPage() {
  await requirePageActor("staff");
  return (
    <>
      <PageHeader
        title="Approvals"
        lead="Promotions on approve ladders and proposed step-downs wait here. Approving moves the athlete at once; declining keeps them where they are until a new session."
      />
      <ApprovalList />
    </>
  );
}
