import { newToken } from "@/lib/auth/tokens";
import type { SeededClub } from "@/lib/seed/seed-club";
import type { Db } from "@/models";
import { sealToken } from "@/lib/security/token-seal";

/**
 * Demo notices setup: every athlete gets a calendar-feed link, the physio hears about each alert, the head
 * coach reads a daily digest, the assistant coach sees alerts in the app only.
 */
export async function seedNotices(d: Db, club: SeededClub): Promise<void> {
  const { sequelize, Athlete, CalendarToken, Membership, NotificationSetting } = d;
  await sequelize.transaction(async (transaction) => {
    const athletes = await Athlete.findAll({ where: { teamId: club.teamId }, attributes: ["id"], transaction });
    for (const a of athletes) {
      const { token, hash } = newToken(32);
      await CalendarToken.create(
        {
          teamId: club.teamId,
          athleteId: a.id,
          tokenHash: hash,
          tokenSealed: sealToken(token),
          createdBy: null,
          revokedAt: null,
          lastUsedAt: null,
        },
        { transaction },
      );
    }
    const staff = await Membership.findAll({
      where: { teamId: club.teamId },
      attributes: ["userId", "role"],
      transaction,
    });
    const choice = { physio: "each", head_coach: "digest", coach: "off" } as const;
    for (const m of staff) {
      if (m.role === "athlete") continue;
      await NotificationSetting.create(
        {
          teamId: club.teamId,
          userId: m.userId,
          alertEmail: choice[m.role],
          lastDigestAt: new Date(),
          alertsSeenAt: null,
        },
        { transaction },
      );
    }
  });
}
