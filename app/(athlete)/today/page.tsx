import type { Metadata } from "next";
import { ServiceWorker } from "@/components/pwa/service-worker";
import { TodayView } from "@/components/today/today-view";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Today" };

export default async function TodayPage() {
  const actor = await requirePageActor("athlete");
  return (
    <>
      <ServiceWorker />
      <TodayView title={`Hi ${actor.name.split(" ")[0]}`} />
    </>
  );
}
