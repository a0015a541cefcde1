import bcrypt from "bcryptjs";
import { DEMO_ATHLETES, DEMO_CLUB, DEMO_COACH, DEMO_OWNER, DEMO_PASSWORD } from "../demo-cast";
import { athletes, teams, users } from "../../schema";
import type { SeedStep } from "../step";

/** The club, its two coaches and eight athletes (six with sign-ins). */
export const demoClub: SeedStep = {
  name: "001-demo-club",
  async run(tx) {
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, Number(process.env.PASSWORD_HASH_COST ?? 12));
    const [team] = await tx.insert(teams).values(DEMO_CLUB).returning({ id: teams.id });
    const teamId = team!.id;
    const [owner, coach] = await tx
      .insert(users)
      .values([
        { teamId, ...DEMO_OWNER, role: "owner", passwordHash },
        { teamId, ...DEMO_COACH, role: "coach", passwordHash },
      ])
      .returning({ id: users.id });
    for (const athlete of DEMO_ATHLETES) {
      const [account] = athlete.account
        ? await tx
            .insert(users)
            .values({ teamId, name: athlete.name, email: athlete.email!, role: "athlete", passwordHash })
            .returning({ id: users.id })
        : [];
      await tx.insert(athletes).values({
        teamId,
        name: athlete.name,
        email: athlete.email,
        userId: account?.id ?? null,
        primaryCoachId: athlete.coach === "owner" ? owner!.id : coach!.id,
      });
    }
  },
};
