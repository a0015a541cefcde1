import type { Metadata } from "next";
import { ApiTokens } from "@/components/settings/api-tokens";
import { NotificationPreferencesForm } from "@/components/settings/notification-preferences-form";
import { Card, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { getPreferences } from "@/lib/server/notifications/get-preferences";
import { isStaff } from "@/lib/permissions";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const actor = await requirePageActor();
  const preferences = await getPreferences(actor);
  return (
    <>
      <PageHeader title="Settings" />
      <div className="flex flex-col gap-6">
        <Card>
          <h2 className="font-display text-lg font-bold">You</h2>
          <dl className="mt-3 grid grid-cols-[8rem_1fr] gap-y-2 text-sm">
            <dt className="text-muted">Name</dt>
            <dd>{actor.name}</dd>
            <dt className="text-muted">E-mail</dt>
            <dd>{actor.email}</dd>
            <dt className="text-muted">Role</dt>
            <dd className="capitalize">{actor.role}</dd>
            <dt className="text-muted">Time zone</dt>
            <dd>{actor.timeZone}</dd>
          </dl>
        </Card>
        <NotificationPreferencesForm initial={preferences} staff={isStaff(actor.role)} timeZone={actor.timeZone} />
        <ApiTokens />
      </div>
    </>
  );
}
