import { notificationPreferences } from "../../schema";
import { DEMO_ATHLETES, DEMO_COACH, DEMO_OWNER } from "../demo-cast";
import { demoTeam } from "../demo-team";
import type { SeedStep } from "../step";

const MONDAY_7 = { digestWeekday: 1, digestHour: 7 };

/**
 * Mail choices for the demo people: everything on, the digest on Monday 07:00 club time; one athlete
 * has turned their weekly summary off, so the settings page shows a real choice.
 */
export const notificationPreferencesStep: SeedStep = {
  name: "006-notification-preferences",
  async run(tx) {
    const { teamId } = await demoTeam(tx);
    const staff = [DEMO_OWNER.email, DEMO_COACH.email].map((email) => ({
      email,
      teamId,
      promotionNotices: true,
      approvalNotices: true,
      weeklyDigest: true,
      athleteSummary: false,
      ...MONDAY_7,
    }));
    const trainees = DEMO_ATHLETES.flatMap((a) =>
      a.email
        ? [
            {
              email: a.email,
              teamId,
              promotionNotices: true,
              approvalNotices: false,
              weeklyDigest: false,
              athleteSummary: a.key !== "jonas",
              ...MONDAY_7,
            },
          ]
        : [],
    );
    await tx.insert(notificationPreferences).values([...staff, ...trainees]).onConflictDoNothing();
  },
};
