import { hashPassword } from "@/lib/data/users";
import { passwordSchema } from "@/lib/validations/password";
import type { Db } from "@/models";
import { DEMO_ATHLETES, DEMO_GROUPS, DEMO_PASSWORD, DEMO_STAFF, DEMO_TEAM } from "./demo-club";

export type SeededClub = { teamId: number; athleteIds: Record<string, number>; userIds: Record<string, number> };

/** Creates the demo club's team, groups, staff and athletes. Extra demo content (history, plans) seeds on top. */
export async function seedClub(d: Db): Promise<SeededClub> {
  const { sequelize, Team, User, Membership, TrainingGroup, Athlete, TeamLoadSettings } = d;
  // The demo password obeys the rule every member's does; a weaker one fails the seed loudly.
  const passwordHash = await hashPassword(passwordSchema.parse(DEMO_PASSWORD));
  return sequelize.transaction(async (transaction) => {
    const team = await Team.create(DEMO_TEAM, { transaction });
    await TeamLoadSettings.create({ teamId: team.id }, { transaction });
    const userIds: Record<string, number> = {};
    for (const s of DEMO_STAFF) {
      const user = await User.create({ name: s.name, email: s.email, passwordHash }, { transaction });
      await Membership.create({ teamId: team.id, userId: user.id, role: s.role }, { transaction });
      userIds[s.email] = user.id;
    }
    const groupIds: Record<string, number> = {};
    for (const [i, name] of DEMO_GROUPS.entries()) {
      groupIds[name] = (await TrainingGroup.create({ teamId: team.id, name, sortOrder: i }, { transaction })).id;
    }
    const athleteIds: Record<string, number> = {};
    for (const a of DEMO_ATHLETES) {
      let userId: number | null = null;
      if (a.email) {
        const user = await User.create({ name: a.name, email: a.email, passwordHash }, { transaction });
        await Membership.create({ teamId: team.id, userId: user.id, role: "athlete" }, { transaction });
        userId = user.id;
        userIds[a.email] = user.id;
      }
      const athlete = await Athlete.create(
        {
          teamId: team.id,
          userId,
          groupId: groupIds[a.group],
          name: a.name,
          sex: a.sex,
          birthDate: a.birthDate,
          bodyMassKg: a.bodyMassKg,
          vmaxMs: a.vmaxMs,
          vmaxTestedOn: "2026-10-06",
          tauS: a.tauS,
          stepLengthM: a.stepLengthM,
          plyoLevel: a.plyoLevel,
        },
        { transaction },
      );
      athleteIds[a.name] = athlete.id;
    }
    return { teamId: team.id, athleteIds, userIds };
  });
}
