import "../support/object-store";
import { describe, expect, it } from "vitest";
import { POST as commentRoute } from "@/app/api/v1/form-checks/[id]/comments/route";
import { DELETE as deleteRoute, GET as getRoute } from "@/app/api/v1/form-checks/[id]/route";
import { GET as listRoute, POST as createFormCheckRoute } from "@/app/api/v1/form-checks/route";
import { listKeys } from "@/lib/server/storage/object-store";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { complete, createFormCheckFor, fileOf, presign, putTo, uploadFile, type UploadTicket } from "../support/form-check-factories";
import { call } from "../support/http";

async function teamWithAthlete() {
  const team = await createTeam();
  const athlete = await createMember(team.teamId, "athlete", "Ada Vell");
  return {
    ...team,
    athlete: athlete.actor,
    staffToken: await bearerFor(team.owner),
    athleteToken: await bearerFor(athlete.actor),
  };
}

describe("form-check uploads through presigned URLs", () => {
  it("round-trips: presign, PUT, complete, then the signed GET returns the same bytes", async () => {
    const t = await teamWithAthlete();
    const bytes = fileOf("video/webm", 5000);
    const ticket = await presign(t.athleteToken, { contentType: "video/webm", size: bytes.length, fileName: "handstand.webm" });
    expect(ticket.status).toBe(201);
    const { uploadId, url, headers } = ticket.data as unknown as UploadTicket;
    expect(url).toContain(`staging/${t.teamId}/${uploadId}`);
    expect(headers["content-type"]).toBe("video/webm");
    expect(await putTo(ticket.data as unknown as UploadTicket, bytes)).toBe(200);

    const done = await complete(t.athleteToken, uploadId);
    expect(done.status).toBe(200);
    expect(done.data).toMatchObject({ uploadId, state: "complete", size: 5000 });
    // The staging object is gone; the file lives at its final key only.
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
    expect(await listKeys(`form-checks/${t.teamId}/`)).toEqual([`form-checks/${t.teamId}/${t.athlete.athleteId}/${uploadId}.webm`]);

    const created = await call(createFormCheckRoute, { token: t.athleteToken, json: { uploadId, note: "Wall walk, third set" } });
    expect(created.status).toBe(201);
    expect(created.data).toMatchObject({ athleteId: t.athlete.athleteId, kind: "video", fileName: "handstand.webm", size: 5000 });

    const read = await call(getRoute, { token: t.staffToken, params: { id: created.data.id as string } });
    expect(read.status).toBe(200);
    const signed = await fetch(read.data.mediaUrl as string);
    expect(signed.status).toBe(200);
    expect(new Uint8Array(await signed.arrayBuffer())).toEqual(bytes);
    // Short-lived: the signature is valid for five minutes only.
    expect(new URL(read.data.mediaUrl as string).searchParams.get("X-Amz-Expires")).toBe("300");
  });

  it("refuses a file whose bytes are not the declared type, and removes it", async () => {
    const t = await teamWithAthlete();
    const pngAsWebm = fileOf("image/png", 3000);
    const ticket = await presign(t.athleteToken, { contentType: "video/webm", size: pngAsWebm.length });
    const { uploadId } = ticket.data as unknown as UploadTicket;
    expect(await putTo(ticket.data as unknown as UploadTicket, pngAsWebm)).toBe(200);
    expect(await listKeys(`staging/${t.teamId}/`)).toHaveLength(1);

    const done = await complete(t.athleteToken, uploadId);
    expect(done.status).toBe(422);
    expect(done.data.error?.issues?.[0]?.path).toBe("contentType");
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
    expect(await listKeys(`form-checks/${t.teamId}/`)).toEqual([]);
    // A refused upload cannot become a form check, nor be completed again.
    expect((await call(createFormCheckRoute, { token: t.athleteToken, json: { uploadId } })).status).toBe(422);
    expect((await complete(t.athleteToken, uploadId)).status).toBe(409);
  });

  it("refuses a HEIC photo sent as an MP4 video (its brand says image)", async () => {
    const t = await teamWithAthlete();
    const heic = fileOf("image/heic", 1000);
    const ticket = await presign(t.athleteToken, { contentType: "video/mp4", size: heic.length });
    await putTo(ticket.data as unknown as UploadTicket, heic);
    expect((await complete(t.athleteToken, ticket.data.uploadId as string)).status).toBe(422);
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
  });

  it("refuses a file larger than announced, and removes it", async () => {
    const t = await teamWithAthlete();
    const ticket = await presign(t.athleteToken, { contentType: "image/jpeg", size: 1000 });
    await putTo(ticket.data as unknown as UploadTicket, fileOf("image/jpeg", 4000));
    const done = await complete(t.athleteToken, ticket.data.uploadId as string);
    expect(done.status).toBe(422);
    expect(done.data.error?.issues?.[0]?.path).toBe("size");
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
  });

  it("refuses an over-size file or a type it does not take before any byte is sent", async () => {
    const t = await teamWithAthlete();
    const bigVideo = await presign(t.athleteToken, { contentType: "video/mp4", size: 200 * 1024 * 1024 + 1 });
    expect(bigVideo.status).toBe(413);
    const bigPhoto = await presign(t.athleteToken, { contentType: "image/png", size: 15 * 1024 * 1024 + 1 });
    expect(bigPhoto.status).toBe(413);
    const gif = await presign(t.athleteToken, { contentType: "image/gif", size: 100 });
    expect(gif.status).toBe(422);
    expect(gif.data.error?.issues?.[0]?.path).toBe("contentType");
    const empty = await presign(t.athleteToken, { contentType: "image/png", size: 0 });
    expect(empty.status).toBe(422);
    const wrongPurpose = await presign(t.athleteToken, { contentType: "image/png", size: 10, purpose: "avatar" });
    expect(wrongPurpose.status).toBe(422);
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
  });

  it("answers 409 to a second completion and 422 to a completion before the PUT", async () => {
    const t = await teamWithAthlete();
    const bytes = fileOf("image/png", 800);
    const ticket = await presign(t.athleteToken, { contentType: "image/png", size: bytes.length });
    const id = ticket.data.uploadId as string;
    expect((await complete(t.athleteToken, id)).status).toBe(422); // nothing arrived yet; still pending
    await putTo(ticket.data as unknown as UploadTicket, bytes);
    expect((await complete(t.athleteToken, id)).status).toBe(200);
    const again = await complete(t.athleteToken, id);
    expect(again.status).toBe(409);
    expect(await listKeys(`form-checks/${t.teamId}/`)).toHaveLength(1);
  });

  it("never puts a path-like file name in a storage key and shows it sanitised", async () => {
    const t = await teamWithAthlete();
    const uploadId = await uploadFile(t.athleteToken, {
      contentType: "image/jpeg",
      bytes: fileOf("image/jpeg", 600),
      fileName: "../../etc/\u202Epasswd\u0007.jpg",
    });
    const keys = [...(await listKeys(`form-checks/${t.teamId}/`)), ...(await listKeys("staging/"))];
    expect(keys.some((key) => key.includes("passwd") || key.includes(".."))).toBe(false);
    const created = await call(createFormCheckRoute, { token: t.athleteToken, json: { uploadId } });
    expect(created.data.fileName).toBe("passwd.jpg");
    expect(created.data.kind).toBe("photo");
  });

  it("makes staff name the athlete, and lets a coach upload for an athlete without a sign-in", async () => {
    const t = await teamWithAthlete();
    const noName = await presign(t.staffToken, { contentType: "image/png", size: 10 });
    expect(noName.status).toBe(422);
    expect(noName.data.error?.issues?.[0]?.path).toBe("athleteId");
    const recordOnly = await createAthleteRecord(t.teamId, "Bo Ranke");
    const id = await createFormCheckFor(t.staffToken, { athleteId: recordOnly, note: "Filmed at the club" });
    const list = await call(listRoute, { token: t.staffToken, path: `/api/v1/form-checks?athleteId=${recordOnly}` });
    expect((list.data.items as { id: string; athleteName: string }[]).map((x) => [x.id, x.athleteName])).toEqual([[id, "Bo Ranke"]]);
  });
});

describe("form-check access", () => {
  it("answers 404 to another team for uploads and form checks, and leaves their file alone", async () => {
    const a = await teamWithAthlete();
    const b = await teamWithAthlete();
    const ticket = await presign(b.athleteToken, { contentType: "image/png", size: 500 });
    await putTo(ticket.data as unknown as UploadTicket, fileOf("image/png", 500));
    expect((await complete(a.staffToken, ticket.data.uploadId as string)).status).toBe(404);
    expect((await complete(b.athleteToken, ticket.data.uploadId as string)).status).toBe(200);

    const theirs = await createFormCheckFor(b.athleteToken);
    expect((await call(getRoute, { token: a.staffToken, params: { id: theirs } })).status).toBe(404);
    expect((await call(deleteRoute, { token: a.staffToken, params: { id: theirs }, method: "DELETE" })).status).toBe(404);
    const comment = await call(commentRoute, { token: a.staffToken, params: { id: theirs }, json: { atSeconds: 1, body: "Hi" } });
    expect(comment.status).toBe(404);
    expect((await call(createFormCheckRoute, { token: a.staffToken, json: { uploadId: ticket.data.uploadId } })).status).toBe(404);
    const aList = await call(listRoute, { token: a.staffToken, path: "/api/v1/form-checks" });
    expect(aList.data.items).toEqual([]);
    expect(await listKeys(`form-checks/${b.teamId}/`)).toHaveLength(2);
    // Staff of team A cannot upload for team B's athlete either.
    const cross = await presign(a.staffToken, { contentType: "image/png", size: 10, athleteId: b.athlete.athleteId });
    expect(cross.status).toBe(404);
  });

  it("shows an athlete only their own form checks; comments are for staff", async () => {
    const t = await teamWithAthlete();
    const other = await createMember(t.teamId, "athlete", "Cy Morrow");
    const otherToken = await bearerFor(other.actor);
    const mine = await createFormCheckFor(t.athleteToken);
    expect((await call(getRoute, { token: otherToken, params: { id: mine } })).status).toBe(404);
    expect((await call(deleteRoute, { token: otherToken, params: { id: mine }, method: "DELETE" })).status).toBe(404);
    const theirList = await call(listRoute, { token: otherToken, path: `/api/v1/form-checks?athleteId=${t.athlete.athleteId}` });
    expect(theirList.data.items).toEqual([]);

    const athleteComment = await call(commentRoute, { token: t.athleteToken, params: { id: mine }, json: { atSeconds: 1, body: "Me" } });
    expect(athleteComment.status).toBe(403);
    const coach = await createMember(t.teamId, "coach", "Dee Coach");
    const coachToken = await bearerFor(coach.actor);
    const first = await call(commentRoute, { token: coachToken, params: { id: mine }, json: { atSeconds: 2.5, body: "Stack hips over shoulders" } });
    expect(first.status).toBe(201);
    expect(first.data).toMatchObject({ atSeconds: 2.5, authorName: "Dee Coach" });
    await call(commentRoute, { token: coachToken, params: { id: mine }, json: { atSeconds: 0.5, body: "Good entry" } });
    const bad = await call(commentRoute, { token: coachToken, params: { id: mine }, json: { atSeconds: -1, body: "" } });
    expect(bad.status).toBe(422);
    const read = await call(getRoute, { token: t.athleteToken, params: { id: mine } });
    expect((read.data.comments as { body: string }[]).map((c) => c.body)).toEqual(["Good entry", "Stack hips over shoulders"]);
    expect(read.data.commentCount).toBe(2);
  });

  it("pages the list newest first with a cursor", async () => {
    const t = await teamWithAthlete();
    const ids = [];
    for (let i = 0; i < 3; i += 1) ids.push(await createFormCheckFor(t.athleteToken, { note: `n${i}` }));
    const first = await call(listRoute, { token: t.staffToken, path: "/api/v1/form-checks?limit=2" });
    expect((first.data.items as { id: string }[]).map((x) => x.id)).toEqual([ids[2], ids[1]]);
    const next = await call(listRoute, { token: t.staffToken, path: `/api/v1/form-checks?limit=2&cursor=${first.data.nextCursor}` });
    expect((next.data.items as { id: string }[]).map((x) => x.id)).toEqual([ids[0]]);
    expect(next.data.nextCursor).toBeNull();
    const forged = await call(listRoute, { token: t.staffToken, path: "/api/v1/form-checks?cursor=bm90LWpzb24" });
    expect(forged.status).toBe(422);
  });
});

describe("form-check bad input never becomes a 500", () => {
  it.each([
    ["{not json", 400],
    ["[]", 422],
    [JSON.stringify({ contentType: "video/webm", size: "12", purpose: "form_check" }), 422],
    [JSON.stringify({ contentType: "video/webm", size: 1.5, purpose: "form_check" }), 422],
    [JSON.stringify({ contentType: "video/webm", size: 1e300, purpose: "form_check" }), 422],
    [JSON.stringify({ contentType: "video/webm", size: 10, purpose: "form_check", extra: 1 }), 422],
    [JSON.stringify({ contentType: "video/webm", size: 10, purpose: "form_check", athleteId: "x" }), 422],
    [JSON.stringify({ contentType: "video/webm", size: 10, purpose: "form_check", fileName: "x".repeat(400) }), 422],
  ])("POST /api/v1/uploads with %s → %i", async (rawBody, status) => {
    const t = await teamWithAthlete();
    const { POST } = await import("@/app/api/v1/uploads/route");
    const res = await call(POST, { token: t.athleteToken, rawBody, headers: { "content-type": "application/json" }, method: "POST" });
    expect(res.status).toBe(status);
    expect(res.data.error?.code).toBeTruthy();
  });

  it("answers 404 for ids that are not UUIDs, and 422 for bad comments, posters and links", async () => {
    const t = await teamWithAthlete();
    expect((await complete(t.athleteToken, "../../staging")).status).toBe(404);
    expect((await call(getRoute, { token: t.staffToken, params: { id: "1 or 1=1" } })).status).toBe(404);
    const id = await createFormCheckFor(t.athleteToken);
    for (const json of [{ atSeconds: "2", body: "x" }, { atSeconds: 2 }, { atSeconds: 2, body: "x".repeat(1001) }, { atSeconds: 1e9, body: "x" }]) {
      expect((await call(commentRoute, { token: t.staffToken, params: { id }, json })).status).toBe(422);
    }
    const uploadId = await uploadFile(t.athleteToken, { contentType: "video/webm", bytes: fileOf("video/webm", 500) });
    for (const json of [
      { uploadId, poster: "data:image/svg+xml;base64,PHN2Zz4=" },
      { uploadId, poster: `data:image/jpeg;base64,${"A".repeat(200_000)}` },
      { uploadId, rungId: crypto.randomUUID() },
      { uploadId, logId: crypto.randomUUID() },
      { uploadId, athleteId: crypto.randomUUID() },
    ]) {
      const res = await call(createFormCheckRoute, { token: t.athleteToken, json });
      expect([413, 422]).toContain(res.status);
    }
    const ok = await call(createFormCheckRoute, { token: t.athleteToken, json: { uploadId, poster: "data:image/jpeg;base64,/9j/4AAQ" } });
    expect(ok.status).toBe(201);
    expect(ok.data.poster).toBe("data:image/jpeg;base64,/9j/4AAQ");
    // One upload, one form check.
    expect((await call(createFormCheckRoute, { token: t.athleteToken, json: { uploadId } })).status).toBe(409);
  });
});
