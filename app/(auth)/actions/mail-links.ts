"use server";

import { redirect } from "next/navigation";
import { approveByLink } from "@/lib/server/notifications/approval-link";
import { unsubscribe } from "@/lib/server/notifications/unsubscribe";

/** The confirm page's POST: the approval happens here, never on the GET a mail scanner follows. */
export async function approveFromLinkAction(formData: FormData): Promise<void> {
  const token = String(formData.get("token") ?? "");
  const result = await approveByLink(token);
  redirect(`/approve/${encodeURIComponent(token)}?result=${result}`);
}

export async function unsubscribeFromLinkAction(formData: FormData): Promise<void> {
  const token = String(formData.get("token") ?? "");
  const done = await unsubscribe(token);
  redirect(`/unsubscribe/${encodeURIComponent(token)}?result=${done ? "done" : "invalid"}`);
}
