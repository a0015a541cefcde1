import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { OwnerBilling } from "@/components/billing/owner-billing";
import { TestModeBanner } from "@/components/billing/test-mode-banner";
import { Notice, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { paymentsConfig } from "@/lib/server/billing/payments-config";

export const metadata: Metadata = { title: "Billing" };

export default async function BillingPage() {
  const actor = await requirePageActor("staff");
  if (actor.role !== "owner") redirect("/coach");
  const config = paymentsConfig();
  return (
    <>
      {config?.testMode ? <TestModeBanner /> : null}
      <PageHeader title="Billing" lead="Monthly coaching offers, who is paying, and what arrived this month." />
      {config ? null : (
        <div className="mb-6">
          <Notice tone="ember">Payments are not set up on this server, so nobody is asked to pay and no plan depends on it.</Notice>
        </div>
      )}
      <OwnerBilling />
    </>
  );
}
