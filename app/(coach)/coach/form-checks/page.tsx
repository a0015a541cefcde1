import type { Metadata } from "next";
import { FormCheckList } from "@/components/form-checks/form-check-list";
import { FormCheckUploader } from "@/components/form-checks/form-check-uploader";
import { PageHeader } from "@/components/ui/card";
import { listAthletes } from "@/lib/server/athletes/list-athletes";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Form checks" };

export default async function CoachFormChecksPage() {
  const actor = await requirePageActor("staff");
  // The first 100 athletes by name feed the filter and the uploader's picker.
  const { items } = await listAthletes(actor, { limit: 100 });
  const athletes = items.map((a) => ({ id: a.id, name: a.name }));
  return (
    <>
      <PageHeader title="Form checks" lead="Videos and photos from your athletes. Open one to review it frame by frame and comment on a moment." />
      <div className="grid gap-6 lg:grid-cols-[1fr_360px]">
        <FormCheckList basePath="/coach/form-checks" athletes={athletes} emptyText="When an athlete sends a clip, it shows up here for review." />
        <FormCheckUploader basePath="/coach/form-checks" athletes={athletes} />
      </div>
    </>
  );
}
