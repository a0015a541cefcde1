"use server";

import { revalidatePath } from "next/cache";
import { NotFound } from "@/lib/errors";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { retryFailedJob } from "@/lib/server/jobs/retry-failed-job";

export async function retryJobAction(formData: FormData): Promise<void> {
  const actor = await requirePageActor("staff");
  try {
    await retryFailedJob(actor, String(formData.get("jobId") ?? ""));
  } catch (error) {
    // Retried already (another tab), or no failed job of this team: the refreshed list shows what is left.
    if (!(error instanceof NotFound)) throw error;
  }
  revalidatePath("/coach/admin/jobs");
}
