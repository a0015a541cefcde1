"use server";

import { revalidatePath } from "next/cache";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { retryFailedJob } from "@/lib/server/jobs/retry-failed-job";

export async function retryJobAction(formData: FormData): Promise<void> {
  const actor = await requirePageActor("staff");
  await retryFailedJob(actor, String(formData.get("jobId") ?? ""));
  revalidatePath("/coach/admin/jobs");
}
