import "server-only";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import type { BlockKind } from "@/lib/load/types";
import { AppError } from "@/lib/errors";
import { describeRestriction, isCurrent, type Restriction, type RestrictionRule } from "@/lib/restrictions/rules";
import type { CreateRestrictionInput } from "@/lib/validations/restrictions";
import { db, type Restriction as RestrictionRow, type RestrictionOverride as RestrictionOverrideRow } from "@/models";
import { userNames } from "./users";

/** A stored row in the shape lib/restrictions/rules.ts checks. */
function toRestriction(row: RestrictionRow, names: ReadonlyMap<number, string>): Restriction {
  const base = {
    id: row.id,
    athleteId: row.athleteId,
    startsOn: row.startsOn,
    endsOn: row.endsOn,
    liftedOn: row.liftedOn,
    note: row.note,
    setByName: row.createdBy ? (names.get(row.createdBy) ?? "Medical staff") : "Medical staff",
  };
  if (row.rule === "no_kind")
    return { ...base, rule: "no_kind", blockKinds: JSON.parse(row.blockKinds ?? "[]") as BlockKind[] };
  if (row.rule === "no_training") return { ...base, rule: "no_training" };
  if (row.rule === "max_intensity") return { ...base, rule: "max_intensity", maxPct: row.limitValue ?? 100 };
  return { ...base, rule: "contact_cap", maxContacts: row.limitValue ?? 0 };
}

/**
 * Restrictions of a team (or some of its athletes) that still apply on or after `from`, oldest first.
 * Without `from`, every restriction ever set, lifted ones included.
 */
export async function listRestrictions({
  teamId,
  athleteIds,
  from,
  transaction,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  from?: string;
  transaction?: Transaction;
}): Promise<Restriction[]> {
  const { Restriction } = await db();
  const where: WhereOptions = { teamId };
  if (athleteIds) Object.assign(where, { athleteId: { [Op.in]: [...athleteIds] } });
  if (from) {
    Object.assign(where, {
      [Op.and]: [
        { [Op.or]: [{ endsOn: null }, { endsOn: { [Op.gte]: from } }] },
        { [Op.or]: [{ liftedOn: null }, { liftedOn: { [Op.gt]: from } }] },
      ],
    });
  }
  const rows = await Restriction.findAll({
    where,
    order: [
      ["startsOn", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  const names = await userNames(
    rows.map((r) => r.createdBy),
    transaction,
  );
  return rows.map((r) => toRestriction(r, names));
}

/** Every restriction ever set for one athlete, newest start first (the athlete page's history). */
export async function listAthleteRestrictions({
  teamId,
  athleteId,
}: {
  teamId: number;
  athleteId: number;
}): Promise<Restriction[]> {
  return (await listRestrictions({ teamId, athleteIds: [athleteId] })).reverse();
}

/** What still applies to one athlete on `today` or later (their own page). */
export async function listCurrentRestrictions({
  teamId,
  athleteId,
  today,
}: {
  teamId: number;
  athleteId: number;
  today: string;
}): Promise<Restriction[]> {
  return (await listRestrictions({ teamId, athleteIds: [athleteId], from: today })).filter((r) => isCurrent(r, today));
}

/** What a new restriction row holds: the physio's form, or the rule an availability level implies. */
export type RestrictionValues = RestrictionRule & { startsOn: string; endsOn?: string | null; note: string };

/** A restriction on an athlete of the team (404 for an athlete elsewhere). */
export async function insertRestriction({
  teamId,
  athleteId,
  actorUserId,
  input,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  actorUserId: number;
  input: CreateRestrictionInput | RestrictionValues;
  transaction: Transaction;
}): Promise<Restriction> {
  const { Athlete, Restriction } = await db();
  const athlete = await Athlete.findOne({ where: { id: athleteId, teamId }, attributes: ["id"], transaction });
  if (!athlete) throw new AppError("not_found", "No such athlete");
  const row = await Restriction.create(
    {
      teamId,
      athleteId,
      rule: input.rule,
      blockKinds: input.rule === "no_kind" ? JSON.stringify(input.blockKinds) : null,
      limitValue:
        input.rule === "max_intensity" ? input.maxPct : input.rule === "contact_cap" ? input.maxContacts : null,
      startsOn: input.startsOn,
      endsOn: input.endsOn ?? null,
      liftedOn: null,
      note: input.note,
      createdBy: actorUserId,
      liftedBy: null,
    },
    { transaction },
  );
  return toRestriction(row, await userNames([actorUserId], transaction));
}

/** One of the team's restrictions; 404 for another team's. */
export async function getRestriction({
  teamId,
  restrictionId,
  transaction,
}: {
  teamId: number;
  restrictionId: number;
  transaction: Transaction;
}): Promise<Restriction> {
  const { Restriction } = await db();
  const row = await Restriction.findOne({ where: { id: restrictionId, teamId }, transaction });
  if (!row) throw new AppError("not_found", "No such restriction");
  return toRestriction(row, await userNames([row.createdBy], transaction));
}

export async function setRestrictionLifted({
  restrictionId,
  liftedOn,
  liftedBy,
  transaction,
}: {
  restrictionId: number;
  liftedOn: string;
  liftedBy: number;
  transaction: Transaction;
}): Promise<void> {
  const { Restriction } = await db();
  await Restriction.update({ liftedOn, liftedBy }, { where: { id: restrictionId }, transaction });
}

/** The team id of a restriction's athlete, so a handler can check the asker against it; null when unknown. */
export async function restrictionTeam({
  restrictionId,
}: {
  restrictionId: number;
}): Promise<{ teamId: number; athleteId: number } | null> {
  const { Restriction } = await db();
  const row = await Restriction.findByPk(restrictionId, { attributes: ["teamId", "athleteId"] });
  return row ? { teamId: row.teamId, athleteId: row.athleteId } : null;
}

export type OverrideRow = {
  id: number;
  restrictionId: number;
  /** The restriction it went past, in words ("No max velocity, Mon 7 Dec – Sun 13 Dec"). */
  restriction: string;
  sessionDate: string;
  detail: string;
  reason: string;
  who: string;
  createdAt: string;
};

/** Every time a coach planned past one of the athlete's restrictions, newest first. */
export async function listOverrides({
  teamId,
  athleteId,
}: {
  teamId: number;
  athleteId: number;
}): Promise<OverrideRow[]> {
  const { RestrictionOverride, Restriction } = await db();
  const rows = await RestrictionOverride.findAll({
    where: { teamId, athleteId },
    include: [{ model: Restriction, as: "restriction" }],
    order: [
      ["createdAt", "DESC"],
      ["id", "DESC"],
    ],
  });
  const names = await userNames(rows.flatMap((r) => [r.userId, restrictionOf(r)?.createdBy ?? null]));
  return rows.map((r) => {
    const restriction = restrictionOf(r);
    return {
      id: r.id,
      restrictionId: r.restrictionId,
      restriction: restriction ? describeRestriction(toRestriction(restriction, names)) : "A restriction since removed",
      sessionDate: r.sessionDate,
      detail: r.detail,
      reason: r.reason,
      who: r.userId ? (names.get(r.userId) ?? "A former member") : "A former member",
      createdAt: r.createdAt.toISOString(),
    };
  });
}

function restrictionOf(row: RestrictionOverrideRow): RestrictionRow | null {
  return row.restriction ?? null;
}

/** Records that a coach planned past a restriction; the new row's id. */
export async function insertOverride({
  transaction,
  ...values
}: {
  transaction: Transaction;
  teamId: number;
  restrictionId: number;
  athleteId: number;
  sessionId: number;
  sessionDate: string;
  detail: string;
  reason: string;
  userId: number;
}): Promise<number> {
  const { RestrictionOverride } = await db();
  const row = await RestrictionOverride.create(values, { transaction });
  return row.id;
}
