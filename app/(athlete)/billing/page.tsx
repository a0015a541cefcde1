import type { Metadata } from "next";
import { AthleteMembership } from "@/components/billing/athlete-membership";
import { TestModeBanner } from "@/components/billing/test-mode-banner";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { paymentsConfig } from "@/lib/server/billing/payments-config";

export const metadata: Metadata = { title: "Membership" };

export default async function MembershipPage({ searchParams }: { searchParams: Promise<{ checkout?: string }> }) {
  await requirePageActor("athlete");
  const { checkout } = await searchParams;
  return (
    <>
      {paymentsConfig()?.testMode ? <TestModeBanner /> : null}
      <PageHeader title="Membership" />
      <AthleteMembership returnedFromCheckout={Boolean(checkout && checkout !== "cancelled")} />
    </>
  );
}
