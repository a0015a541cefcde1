import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as createAthleteRoute } from "@/app/api/v1/athletes/route";
import { POST as inviteCoachRoute } from "@/app/api/v1/invites/route";
import { db } from "@/db/client";
import { athletes, invites } from "@/db/schema";
import { loadActor } from "@/lib/server/auth/load-actor";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";
import { acceptInvite } from "@/lib/server/invites/accept-invite";
import { findInvite } from "@/lib/server/invites/find-invite";
import { requestPasswordReset } from "@/lib/server/passwords/request-password-reset";
import { resetPassword } from "@/lib/server/passwords/reset-password";
import { bearerFor, createMember, createTeam, uniqueEmail } from "../support/factories";
import { call } from "../support/http";
import { firstLink, waitForMail } from "../support/mail";
import { drainQueue } from "../support/queue";

const noHeaders = new Headers();

describe("invites", () => {
  it("e-mails a single-use link that links the new account to the athlete record", async () => {
    const { owner } = await createTeam();
    const email = uniqueEmail("invitee");
    const res = await call(createAthleteRoute, { token: await bearerFor(owner), json: { name: "Rosa Quill", email, invite: true } });
    expect(res.status).toBe(201);
    expect(res.data.invitePending).toBe(true);

    await drainQueue(); // the worker sends it
    const [mail] = await waitForMail(email);
    expect(mail?.subject).toContain("invited you");
    expect(mail?.html).toContain("<");
    const link = firstLink(mail!, "/invite/");
    expect(link.startsWith(new URL("/invite/", process.env.APP_URL).toString())).toBe(true); // absolute, on the configured origin
    const token = link.split("/invite/")[1]!;

    expect(await findInvite(token)).toMatchObject({ email, role: "athlete", athleteName: "Rosa Quill" });
    const { userId } = await acceptInvite(token, { name: "Rosa Quill", password: "a-strong-password" });
    const actor = await loadActor(userId);
    expect(actor).toMatchObject({ role: "athlete", athleteId: res.data.id, teamId: owner.teamId });
    expect(await verifyCredentials({ email, password: "a-strong-password" }, noHeaders)).toEqual({ id: userId });

    // Single use.
    expect(await findInvite(token)).toBeNull();
    await expect(acceptInvite(token, { name: "Again", password: "a-strong-password" })).rejects.toThrow(/No such invite/);
    const [record] = await db.select({ userId: athletes.userId }).from(athletes).where(eq(athletes.id, res.data.id as string));
    expect(record?.userId).toBe(userId);
  });

  it("refuses an expired invite", async () => {
    const { owner } = await createTeam();
    const email = uniqueEmail("late");
    await call(createAthleteRoute, { token: await bearerFor(owner), json: { name: "Late", email, invite: true } });
    await drainQueue();
    const token = firstLink((await waitForMail(email))[0]!, "/invite/").split("/invite/")[1]!;
    await db.update(invites).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invites.email, email));
    expect(await findInvite(token)).toBeNull();
    await expect(acceptInvite(token, { name: "Late", password: "a-strong-password" })).rejects.toThrow();
  });

  it("lets only the owner invite coaches", async () => {
    const { owner, teamId } = await createTeam();
    const { actor: coach } = await createMember(teamId, "coach");
    const email = uniqueEmail("newcoach");
    expect((await call(inviteCoachRoute, { token: await bearerFor(coach), json: { email } })).status).toBe(403);
    expect((await call(inviteCoachRoute, { token: await bearerFor(owner), json: { email } })).status).toBe(201);
    await drainQueue();
    const token = firstLink((await waitForMail(email))[0]!, "/invite/").split("/invite/")[1]!;
    const { userId } = await acceptInvite(token, { name: "New Coach", password: "a-strong-password" });
    expect((await loadActor(userId))?.role).toBe("coach");
  });
});

describe("password reset", () => {
  it("e-mails a one-time link that sets a new password", async () => {
    const { ownerEmail } = await createTeam();
    await requestPasswordReset(ownerEmail);
    await drainQueue();
    const [mail] = await waitForMail(ownerEmail);
    const token = firstLink(mail!, "/reset-password/").split("/reset-password/")[1]!;
    await resetPassword(token, "a-brand-new-password");
    expect(await verifyCredentials({ email: ownerEmail, password: "a-brand-new-password" }, noHeaders)).not.toBeNull();
    await expect(resetPassword(token, "another-new-password")).rejects.toThrow(/No such reset link/);
  });

  it("sends nothing for an unknown address", async () => {
    const email = uniqueEmail("nobody");
    await requestPasswordReset(email);
    await drainQueue();
    expect(await waitForMail(email, 1, 800)).toHaveLength(0);
  });
});
