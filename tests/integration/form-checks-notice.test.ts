import "../support/object-store";
import { describe, expect, it } from "vitest";
import { POST as commentRoute } from "@/app/api/v1/form-checks/[id]/comments/route";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { createFormCheckFor } from "../support/form-check-factories";
import { call } from "../support/http";
import { waitForMail } from "../support/mail";
import { drainQueue } from "../support/queue";

describe("form-check comment notice", () => {
  it("e-mails the athlete once per comment, through the queue, with the pinned time", async () => {
    const { teamId, owner } = await createTeam();
    const athlete = await createMember(teamId, "athlete", "Noor Haddad");
    const checkId = await createFormCheckFor(await bearerFor(athlete.actor));
    const res = await call(commentRoute, {
      token: await bearerFor(owner),
      params: { id: checkId },
      json: { atSeconds: 62.4, body: "Lock the elbows before the lean" },
    });
    expect(res.status).toBe(201);
    expect(await waitForMail(athlete.email, 1, 500)).toHaveLength(0); // nothing is sent inside the request

    await drainQueue();
    await drainQueue(); // a second pass finds the delivery recorded and sends nothing more
    const mails = await waitForMail(athlete.email, 1);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.subject).toContain("at 01:02");
    expect(mails[0]!.text).toContain("Lock the elbows before the lean");
    expect(mails[0]!.text).toContain(`/form-checks/${checkId}`);
  });
});
