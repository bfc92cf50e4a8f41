import { hashPassword } from "@/lib/data/users";
import { passwordSchema } from "@/lib/validations/password";
import type { Role } from "@/lib/auth/roles";
import type { Db } from "@/models";

export const TEST_PASSWORD = "test-password-123";

type Person = { name: string; email: string; role: Role };

/** A small invented team for tests, independent of the demo seed. */
export async function createTestTeam(
  d: Db,
  { name = "Test Track Club", people = defaultPeople(name) }: { name?: string; people?: Person[] } = {},
) {
  const passwordHash = await hashPassword(passwordSchema.parse(TEST_PASSWORD));
  const team = await d.Team.create({ name, timeZone: "Europe/London", weekStartDay: 1 });
  await d.TeamLoadSettings.create({ teamId: team.id });
  const group = await d.TrainingGroup.create({ teamId: team.id, name: "Sprint", sortOrder: 0 });
  const users: Record<string, { userId: number; athleteId: number | null; membershipId: number }> = {};
  for (const p of people) {
    const user = await d.User.create({ name: p.name, email: p.email, passwordHash });
    const membership = await d.Membership.create({ teamId: team.id, userId: user.id, role: p.role });
    let athleteId: number | null = null;
    if (p.role === "athlete") {
      athleteId = (
        await d.Athlete.create({
          teamId: team.id,
          userId: user.id,
          groupId: group.id,
          name: p.name,
          sex: "female",
          birthDate: "2004-01-01",
          bodyMassKg: 60,
          vmaxMs: 9.5,
          vmaxTestedOn: "2026-10-01",
          tauS: 1.15,
          stepLengthM: 2.1,
          plyoLevel: "intermediate",
        })
      ).id;
    }
    users[p.role === "athlete" ? p.email : p.role] = { userId: user.id, athleteId, membershipId: membership.id };
  }
  return { teamId: team.id, groupId: group.id, users };
}

function defaultPeople(team: string): Person[] {
  const slug = team.toLowerCase().replace(/[^a-z]+/g, "");
  return [
    { name: "Hana Head", email: `head@${slug}.test`, role: "head_coach" },
    { name: "Cato Coach", email: `coach@${slug}.test`, role: "coach" },
    { name: "Pia Physio", email: `physio@${slug}.test`, role: "physio" },
    { name: "Ada Athlete", email: `ada@${slug}.test`, role: "athlete" },
    { name: "Ben Athlete", email: `ben@${slug}.test`, role: "athlete" },
  ];
}
