import { describe, expect, it } from "vitest";
import { getPool } from "@/db/client";
import { Forbidden, NotFound } from "@/lib/errors";
import { getBoss } from "@/lib/server/jobs/boss";
import { listFailedJobs } from "@/lib/server/jobs/list-failed-jobs";
import { MAIL_QUEUE } from "@/lib/server/jobs/mail-job";
import { retryFailedJob } from "@/lib/server/jobs/retry-failed-job";
import { createMember, createTeam } from "../support/factories";
import { drainQueue } from "../support/queue";

describe("failed mail jobs", () => {
  it("lists a job that used up its retries for the owner only, and sends it back to the queue", async () => {
    const { teamId, owner } = await createTeam();
    const { owner: stranger } = await createTeam();
    const { actor: coach } = await createMember(teamId, "coach");
    const boss = await getBoss();
    // A promotion id that is not a UUID makes the handler's query throw; no retries left.
    const jobId = await boss.send(MAIL_QUEUE, { kind: "promotion", teamId, promotionId: "not-a-uuid" }, { retryLimit: 0 });
    await drainQueue();

    const failed = await listFailedJobs(owner);
    expect(failed.map((j) => j.id)).toContain(jobId);
    const job = failed.find((j) => j.id === jobId)!;
    expect(job.kind).toBe("promotion");
    expect(job.error).toMatch(/uuid/i);
    expect(await listFailedJobs(stranger)).toEqual([]);
    await expect(listFailedJobs(coach)).rejects.toBeInstanceOf(Forbidden);
    await expect(retryFailedJob(stranger, jobId!)).rejects.toBeInstanceOf(NotFound);

    await retryFailedJob(owner, jobId!);
    const { rows } = await getPool().query("SELECT state FROM pgboss.job WHERE id = $1", [jobId]);
    expect(rows[0]?.state).toBe("retry");
    expect((await listFailedJobs(owner)).map((j) => j.id)).not.toContain(jobId);
  });

  it("answers a job id that is not a UUID (a tampered form) with not found, not a database error", async () => {
    const { owner } = await createTeam();
    for (const jobId of ["not-a-uuid", "", "\u0000"]) await expect(retryFailedJob(owner, jobId)).rejects.toBeInstanceOf(NotFound);
  });
});
