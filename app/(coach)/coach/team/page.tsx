import type { Metadata } from "next";
import { InviteCoachForm } from "@/components/settings/invite-coach-form";
import { Badge, Card, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { listStaff } from "@/lib/server/teams/list-staff";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage() {
  const actor = await requirePageActor("staff");
  const staff = await listStaff(actor);
  return (
    <>
      <PageHeader title="Team" lead={`Coaches of your team. Weeks and days are counted in ${actor.timeZone}.`} />
      <div className="grid gap-6 lg:grid-cols-[1fr_340px]">
        <ul className="flex flex-col gap-2">
          {staff.map((member) => (
            <li key={member.id}>
              <Card className="flex items-center justify-between p-4">
                <span className="font-semibold">{member.name}</span>
                <Badge tone={member.role === "owner" ? "ember" : "moss"}>{member.role}</Badge>
              </Card>
            </li>
          ))}
        </ul>
        {actor.role === "owner" ? <InviteCoachForm /> : null}
      </div>
    </>
  );
}
