import "server-only";
import { Op, type Transaction } from "sequelize";
import type { Role } from "@/lib/auth/roles";
import { db } from "@/models";
import type { AlertEmailMode } from "@/lib/domain/alerts";

/** Physios hear about every alert unless they say otherwise; coaches opt in; athletes never get load alerts. */
function defaultAlertEmail(role: Role): AlertEmailMode {
  return role === "physio" ? "each" : "off";
}

const STAFF_ROLES: Role[] = ["head_coach", "coach", "physio"];

export type NotificationSettingsView = { alertEmail: AlertEmailMode; isDefault: boolean };

export async function getNotificationSettings({
  userId,
  teamId,
  role,
}: {
  userId: number;
  teamId: number;
  role: Role;
}): Promise<NotificationSettingsView> {
  const { NotificationSetting } = await db();
  const row = await NotificationSetting.findOne({ where: { userId, teamId }, attributes: ["alertEmail"] });
  return row
    ? { alertEmail: row.alertEmail, isDefault: false }
    : { alertEmail: defaultAlertEmail(role), isDefault: true };
}

export async function updateNotificationSettings({
  userId,
  teamId,
  alertEmail,
  now = new Date(),
}: {
  userId: number;
  teamId: number;
  alertEmail: AlertEmailMode;
  now?: Date;
}): Promise<NotificationSettingsView> {
  const { sequelize, NotificationSetting } = await db();
  return sequelize.transaction(async (transaction) => {
    const row = await NotificationSetting.findOne({ where: { userId, teamId }, transaction });
    // Switching to the digest starts its window now, so alerts already mailed one by one are not repeated.
    const lastDigestAt = alertEmail === "digest" && row?.alertEmail !== "digest" ? now : (row?.lastDigestAt ?? null);
    if (row) await row.update({ alertEmail, lastDigestAt }, { transaction });
    else
      await NotificationSetting.create(
        { userId, teamId, alertEmail, lastDigestAt, alertsSeenAt: null },
        { transaction },
      );
    return { alertEmail, isDefault: false };
  });
}

export type AlertRecipient = { userId: number; name: string; email: string; role: Role; alertEmail: AlertEmailMode };

/**
 * Only people who joined get the team's mail: a membership exists once an invitation is accepted, and the
 * account must be able to sign in. An invitation nobody accepted (expired, or sent to a mistyped address) is
 * not a membership, so it never receives athletes' data.
 */
const JOINED = { passwordHash: { [Op.ne]: null } };

/** Staff of the team who joined, with their alert e-mail choice (defaults applied). */
export async function listAlertRecipients({
  teamId,
  transaction,
}: {
  teamId: number;
  transaction?: Transaction;
}): Promise<AlertRecipient[]> {
  const { Membership, User, NotificationSetting } = await db();
  const memberships = await Membership.findAll({
    where: { teamId, role: { [Op.in]: STAFF_ROLES } },
    attributes: ["userId", "role"],
    include: [{ model: User, as: "user", attributes: ["id", "name", "email"], where: JOINED, required: true }],
    order: [["id", "ASC"]],
    transaction,
  });
  const settings = await NotificationSetting.findAll({
    where: { teamId },
    attributes: ["userId", "alertEmail"],
    transaction,
  });
  const chosen = new Map(settings.map((s) => [s.userId, s.alertEmail]));
  return memberships.map((m) => {
    const user = m.user!;
    return {
      userId: user.id,
      name: user.name,
      email: user.email,
      role: m.role,
      alertEmail: chosen.get(user.id) ?? defaultAlertEmail(m.role),
    };
  });
}

/** Whether the address belongs to a member of the team who joined (checked again when the mail goes out). */
export async function isJoinedMember({ teamId, email }: { teamId: number; email: string }): Promise<boolean> {
  const { Membership, User } = await db();
  const count = await Membership.count({
    where: { teamId },
    include: [
      {
        model: User,
        as: "user",
        attributes: [],
        where: { ...JOINED, email: email.trim().toLowerCase() },
        required: true,
      },
    ],
  });
  return count > 0;
}

export async function getAlertsSeenAt({ userId, teamId }: { userId: number; teamId: number }): Promise<Date | null> {
  const { NotificationSetting } = await db();
  const row = await NotificationSetting.findOne({ where: { userId, teamId }, attributes: ["alertsSeenAt"] });
  return row?.alertsSeenAt ?? null;
}

/** The member looked at the inbox: everything created until now counts as read. */
export async function markAlertsSeen({
  userId,
  teamId,
  role,
  now = new Date(),
}: {
  userId: number;
  teamId: number;
  role: Role;
  now?: Date;
}): Promise<void> {
  const { sequelize, NotificationSetting } = await db();
  await sequelize.transaction(async (transaction) => {
    const row = await NotificationSetting.findOne({ where: { userId, teamId }, transaction });
    if (row) await row.update({ alertsSeenAt: now }, { transaction });
    else
      await NotificationSetting.create(
        { userId, teamId, alertEmail: defaultAlertEmail(role), lastDigestAt: null, alertsSeenAt: now },
        { transaction },
      );
  });
}

export type DigestSubscriber = {
  settingId: number;
  userId: number;
  teamId: number;
  name: string;
  email: string;
  timeZone: string;
  teamName: string;
  lastDigestAt: Date | null;
};

export async function listDigestSubscribers(): Promise<DigestSubscriber[]> {
  const { NotificationSetting, User, Team, Membership } = await db();
  const rows = await NotificationSetting.findAll({
    where: { alertEmail: "digest" },
    attributes: ["id", "userId", "teamId", "lastDigestAt"],
    include: [
      { model: User, as: "user", attributes: ["name", "email"], where: JOINED, required: true },
      { model: Team, as: "team", attributes: ["name", "timeZone"] },
    ],
  });
  // Only current staff: a removed member keeps a settings row but must not get the team's digest.
  const staff = await Membership.findAll({
    where: { role: { [Op.in]: STAFF_ROLES }, userId: { [Op.in]: rows.map((r) => r.userId) } },
    attributes: ["userId", "teamId"],
  });
  const isStaff = new Set(staff.map((m) => `${m.userId}:${m.teamId}`));
  return rows
    .filter((r) => isStaff.has(`${r.userId}:${r.teamId}`))
    .map((r) => {
      const user = r.user!;
      const team = r.team!;
      return {
        settingId: r.id,
        userId: r.userId,
        teamId: r.teamId,
        name: user.name,
        email: user.email,
        timeZone: team.timeZone,
        teamName: team.name,
        lastDigestAt: r.lastDigestAt,
      };
    });
}

/** Moves a digest window forward if nobody else did since `previous` was read (two processes, one digest). */
export async function claimDigestWindow({
  settingId,
  previous,
  now,
  transaction,
}: {
  settingId: number;
  previous: Date | null;
  now: Date;
  transaction: Transaction;
}): Promise<boolean> {
  const { NotificationSetting } = await db();
  const [count] = await NotificationSetting.update(
    { lastDigestAt: now },
    {
      where: { id: settingId, alertEmail: "digest", lastDigestAt: previous === null ? { [Op.is]: null } : previous },
      transaction,
    },
  );
  return count === 1;
}

export type NoticeTeam = {
  id: number;
  name: string;
  timeZone: string;
  /** ISO weekday, 1 = Monday. */ weekStartDay: number;
};

/** The team facts a notice needs (name for the mail, zone for times, first day of the week). */
export async function getNoticeTeam({
  teamId,
  transaction,
}: {
  teamId: number;
  transaction?: Transaction;
}): Promise<NoticeTeam | null> {
  const { Team } = await db();
  const team = await Team.findByPk(teamId, { attributes: ["id", "name", "timeZone", "weekStartDay"], transaction });
  return team ? { id: team.id, name: team.name, timeZone: team.timeZone, weekStartDay: team.weekStartDay } : null;
}

export async function getPerson({
  userId,
  transaction,
}: {
  userId: number;
  transaction?: Transaction;
}): Promise<{ name: string; email: string } | null> {
  const { User } = await db();
  const user = await User.findByPk(userId, { attributes: ["name", "email"], transaction });
  return user ? { name: user.name, email: user.email } : null;
}

export type AthleteContact = { athleteId: number; name: string; email: string };

/** Athletes of the team who joined with their own login (only they receive calendar invitations). */
export async function listAthleteContacts({
  teamId,
  athleteIds,
  transaction,
}: {
  teamId: number;
  athleteIds: readonly number[];
  transaction?: Transaction;
}): Promise<Map<number, AthleteContact>> {
  const { Athlete, User, Membership } = await db();
  if (athleteIds.length === 0) return new Map();
  const rows = await Athlete.findAll({
    where: { teamId, id: { [Op.in]: [...athleteIds] }, userId: { [Op.ne]: null } },
    attributes: ["id", "name", "userId"],
    include: [{ model: User, as: "user", attributes: ["email"], where: JOINED, required: true }],
    transaction,
  });
  const members = await Membership.findAll({
    where: { teamId, userId: { [Op.in]: rows.map((a) => a.userId as number) } },
    attributes: ["userId"],
    transaction,
  });
  const joined = new Set(members.map((m) => m.userId));
  return new Map(
    rows
      .filter((a) => joined.has(a.userId as number))
      .map((a) => {
        const user = a.user;
        return [a.id, { athleteId: a.id, name: a.name, email: user?.email ?? "" }];
      })
      .filter(([, c]) => (c as AthleteContact).email !== "") as Array<[number, AthleteContact]>,
  );
}
