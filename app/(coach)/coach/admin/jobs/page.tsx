import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { listFailedJobs } from "@/lib/server/jobs/list-failed-jobs";
import { retryJobAction } from "./actions";

export const metadata: Metadata = { title: "Mail jobs" };

export default async function JobsPage() {
  const actor = await requirePageActor("staff");
  if (actor.role !== "owner") redirect("/coach");
  const failed = await listFailedJobs(actor);
  return (
    <>
      <PageHeader
        title="Mail that could not be sent"
        lead="Each mail is tried six times with growing pauses (30 s, 1, 2, 4, 8 min). These gave up; fix the cause (e.g. the mail relay) and send them again."
      />
      {failed.length === 0 ? (
        <EmptyState title="Nothing failed">Every queued mail went out or is still being tried.</EmptyState>
      ) : (
        <ul className="flex flex-col gap-2">
          {failed.map((job) => (
            <li key={job.id}>
              <Card className="flex flex-wrap items-center justify-between gap-4 p-4">
                <div className="min-w-0">
                  <div className="flex items-center gap-2">
                    <Badge tone="danger">{job.kind.replace("_", " ")}</Badge>
                    {job.recipient ? <span className="text-sm">{job.recipient}</span> : null}
                  </div>
                  <p className="mt-1 font-mono text-xs break-words text-danger">{job.error}</p>
                  <p className="mt-1 text-xs text-muted">
                    {job.attempts} attempts · queued {job.createdAt.slice(0, 16).replace("T", " ")} UTC
                  </p>
                </div>
                <form action={retryJobAction}>
                  <input type="hidden" name="jobId" value={job.id} />
                  <Button type="submit" variant="secondary" size="sm">
                    Send again
                  </Button>
                </form>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
