/** Sends queued writes in order; stops at the first network failure so nothing jumps the queue. */
import { api, ApiError } from "./api";
import { enqueue, pendingFor, removePending, type PendingFinish, type PendingSet } from "./offline-queue";

export interface TodayEndpoints {
  /** GET the day for a date, e.g. `/api/v1/me/today?date=…`. */
  today(date: string): string;
}

/** 408, 409 (first copy still in flight), 429 and 5xx are worth retrying; other refusals are final. */
function retryable(error: unknown): boolean {
  if (!(error instanceof ApiError)) return true; // network failure: offline or the server is away
  return error.status === 408 || error.status === 429 || error.status >= 500 || (error.status === 409 && /still being processed/.test(error.message));
}

function sendSet(item: PendingSet) {
  return api("/api/v1/logs", {
    method: "POST",
    headers: { "idempotency-key": item.key },
    json: {
      athleteId: item.athleteId,
      performedOn: item.performedOn,
      entries: [{ rungId: item.rungId, sets: [item.set], pain: item.pain, note: item.note ?? undefined }],
    },
  });
}

async function sendFinish(item: PendingFinish, endpoints: TodayEndpoints) {
  const day = await api<{ logs: { id: string }[] }>(endpoints.today(item.performedOn));
  const first = day.logs[0];
  if (!first) throw new ApiError(422, "validation_failed", "Log a set before finishing the session.");
  await api(`/api/v1/logs/${first.id}`, { method: "PATCH", json: { durationMinutes: item.durationMinutes, sessionRpe: item.sessionRpe } });
}

/** Returns how many writes went through; refused ones stay in the queue with their error. */
export async function sendPending(athleteId: string, endpoints: TodayEndpoints): Promise<number> {
  let sent = 0;
  for (const item of await pendingFor(athleteId)) {
    if (item.error) continue;
    try {
      if (item.kind === "set") await sendSet(item);
      else await sendFinish(item, endpoints);
      await removePending(item.key);
      sent += 1;
    } catch (error) {
      if (retryable(error)) break;
      await enqueue({ ...item, error: error instanceof Error ? error.message : "Refused by the server." });
    }
  }
  return sent;
}
