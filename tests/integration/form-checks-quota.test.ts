import "../support/object-store";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { DELETE as deleteRoute } from "@/app/api/v1/form-checks/[id]/route";
import { listKeys } from "@/lib/server/storage/object-store";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { complete, createFormCheckFor, fileOf, presign, putTo, type UploadTicket } from "../support/form-check-factories";
import { call } from "../support/http";

// Small limits for this file only: the app reads its env on first use, after these stubs.
beforeAll(() => {
  vi.stubEnv("UPLOAD_ATHLETE_QUOTA_BYTES", "10000");
  vi.stubEnv("UPLOAD_MAX_IMAGE_BYTES", "6000");
  vi.stubEnv("UPLOAD_MAX_VIDEO_BYTES", "8000");
});
afterAll(() => {
  vi.unstubAllEnvs();
});

async function athleteToken() {
  const team = await createTeam();
  const athlete = await createMember(team.teamId, "athlete", "Quota Athlete");
  return { teamId: team.teamId, token: await bearerFor(athlete.actor) };
}

describe("per-athlete storage quota and configured size limits", () => {
  it("counts finished files and recent unfinished uploads, and frees space on deletion", async () => {
    const { token } = await athleteToken();
    const first = await createFormCheckFor(token, { bytes: fileOf("video/webm", 6000) });
    const pending = await presign(token, { contentType: "image/png", size: 3000 });
    expect(pending.status).toBe(201);
    // 6000 stored + 3000 reserved: another 2000 would pass 10000.
    const over = await presign(token, { contentType: "image/png", size: 2000 });
    expect(over.status).toBe(422);
    expect(over.data.error?.issues?.[0]?.path).toBe("size");
    expect((await presign(token, { contentType: "image/png", size: 1000 })).status).toBe(201);

    expect((await call(deleteRoute, { token, params: { id: first }, method: "DELETE" })).status).toBe(204);
    expect((await presign(token, { contentType: "image/png", size: 2000 })).status).toBe(201);
  });

  it("applies the configured type limits at presign time and again at completion", async () => {
    const { token, teamId } = await athleteToken();
    expect((await presign(token, { contentType: "image/jpeg", size: 6001 })).status).toBe(413);
    expect((await presign(token, { contentType: "video/webm", size: 8001 })).status).toBe(413);
    // Announced within the limit, stored above it: refused and removed.
    const ticket = await presign(token, { contentType: "image/jpeg", size: 5000 });
    await putTo(ticket.data as unknown as UploadTicket, fileOf("image/jpeg", 7000));
    expect((await complete(token, ticket.data.uploadId as string)).status).toBe(413);
    expect(await listKeys(`staging/${teamId}/`)).toEqual([]);
    expect(await listKeys(`form-checks/${teamId}/`)).toEqual([]);
  });

  it("re-checks the quota at completion against what is stored", async () => {
    const { token, teamId } = await athleteToken();
    // Two reservations that fit one by one (5000 + 5000 = 10000)…
    const a = await presign(token, { contentType: "image/png", size: 5000 });
    const b = await presign(token, { contentType: "image/png", size: 5000 });
    expect([a.status, b.status]).toEqual([201, 201]);
    await putTo(a.data as unknown as UploadTicket, fileOf("image/png", 5000));
    await putTo(b.data as unknown as UploadTicket, fileOf("image/png", 5000));
    expect((await complete(token, a.data.uploadId as string)).status).toBe(200);
    expect((await complete(token, b.data.uploadId as string)).status).toBe(200);
    // …and a third, once the two are stored, no longer fits.
    expect((await presign(token, { contentType: "image/png", size: 1 })).status).toBe(422);
    expect(await listKeys(`form-checks/${teamId}/`)).toHaveLength(2);
  });
});
