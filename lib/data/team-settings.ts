import "server-only";
import type { Transaction } from "sequelize";
import {
  ACWR_METHODS,
  DEFAULT_TEAM_LOAD_SETTINGS,
  METRICS,
  MISSING_LOGS,
  RECOVERY_WORK,
  SPEED_ZONES,
  type AcwrMethod,
  type Metric,
  type MissingLogs,
  type RecoveryWork,
  type SpeedZones,
  type TeamLoadSettings,
} from "@/lib/load/types";
import { AppError } from "@/lib/errors";
import { teamSettingsSchema, type TeamSettingsPatch } from "@/lib/validations/team-settings";
import type { TeamWeekInput } from "@/lib/validations/team-week";
import { db, type TeamLoadSettings as SettingsModel } from "@/models";

const FIELDS = [
  "hsrSpeedMs",
  "nearMaxPct",
  "acwrMethod",
  "acwrMetric",
  "spikeRatio",
  "risingRatio",
  "lowRatio",
  "weeklyChangeLimitPct",
  "recoveryHours",
  "speedZones",
  "hsrPct",
  "sprintSpeedMs",
  "maximalPct",
  "recoveryWork",
  "missingLogs",
  "monotonyLimit",
] as const;

/**
 * The settings columns for a raw query over team_load_settings aliased `s` (lib/data/load.ts). The aliases are
 * quoted: PostgreSQL folds unquoted names to lower case (hsrspeedms), and SQLite accepts the quotes.
 */
export const SETTINGS_SQL_COLUMNS = [
  "s.id AS settings_id",
  ...FIELDS.map((f) => `s.${f.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)} AS "${f}"`),
].join(", ");

export type SettingsRow = {
  [K in (typeof FIELDS)[number]]: K extends "recoveryWork"
    ? string
    : K extends "acwrMethod" | "acwrMetric" | "speedZones" | "missingLogs"
      ? string
      : number;
};
type StoredSettings = Pick<SettingsModel, (typeof FIELDS)[number]>;

function isMethod(v: unknown): v is AcwrMethod {
  return (ACWR_METHODS as readonly unknown[]).includes(v);
}
function isMetric(v: unknown): v is Metric {
  return (METRICS as readonly unknown[]).includes(v);
}

function oneOf<T extends string>(list: readonly T[], v: unknown, fallback: T): T {
  return (list as readonly unknown[]).includes(v) ? (v as T) : fallback;
}

/** Stored JSON text (or an array) of recovery work; anything unreadable falls back to the default. */
function toRecoveryWork(v: unknown): RecoveryWork[] {
  let list: unknown = v;
  if (typeof v === "string") {
    try {
      list = JSON.parse(v);
    } catch {
      list = null;
    }
  }
  return Array.isArray(list)
    ? RECOVERY_WORK.filter((w) => list.includes(w))
    : [...DEFAULT_TEAM_LOAD_SETTINGS.recoveryWork];
}

/** Engine shape from a stored row; unknown stored strings fall back to the defaults. */
export function toEngineSettings(
  row:
    StoredSettings | SettingsRow | (Omit<StoredSettings, "recoveryWork"> & { recoveryWork: readonly string[] }) | null,
): TeamLoadSettings {
  if (!row) return { ...DEFAULT_TEAM_LOAD_SETTINGS, recoveryWork: [...DEFAULT_TEAM_LOAD_SETTINGS.recoveryWork] };
  const d = DEFAULT_TEAM_LOAD_SETTINGS;
  const n = (v: number | null | undefined, fallback: number) => (v === null || v === undefined ? fallback : Number(v));
  return {
    speedZones: oneOf<SpeedZones>(SPEED_ZONES, row.speedZones, d.speedZones),
    hsrPct: n(row.hsrPct, d.hsrPct),
    sprintSpeedMs: n(row.sprintSpeedMs, d.sprintSpeedMs),
    maximalPct: n(row.maximalPct, d.maximalPct),
    recoveryWork: toRecoveryWork(row.recoveryWork),
    missingLogs: oneOf<MissingLogs>(MISSING_LOGS, row.missingLogs, d.missingLogs),
    monotonyLimit: n(row.monotonyLimit, d.monotonyLimit),
    hsrSpeedMs: row.hsrSpeedMs,
    nearMaxPct: row.nearMaxPct,
    acwrMethod: isMethod(row.acwrMethod) ? row.acwrMethod : DEFAULT_TEAM_LOAD_SETTINGS.acwrMethod,
    acwrMetric: isMetric(row.acwrMetric) ? row.acwrMetric : DEFAULT_TEAM_LOAD_SETTINGS.acwrMetric,
    spikeRatio: row.spikeRatio,
    risingRatio: row.risingRatio,
    lowRatio: row.lowRatio,
    weeklyChangeLimitPct: row.weeklyChangeLimitPct,
    recoveryHours: row.recoveryHours,
  };
}

/** The team's thresholds in the engine's shape; the defaults when the team has no row yet. */
export async function getTeamLoadSettings({
  teamId,
  transaction,
}: {
  teamId: number;
  transaction?: Transaction;
}): Promise<TeamLoadSettings> {
  const { TeamLoadSettings } = await db();
  const row = await TeamLoadSettings.findOne({ where: { teamId }, attributes: [...FIELDS], transaction });
  return toEngineSettings(row);
}

/** Merges a partial change into the team's settings; the merged record must pass teamSettingsSchema (else ZodError → 400). */
export async function writeTeamLoadSettings({
  teamId,
  input,
  transaction,
}: {
  teamId: number;
  input: TeamSettingsPatch;
  transaction: Transaction;
}): Promise<TeamLoadSettings> {
  const { TeamLoadSettings } = await db();
  const row = await TeamLoadSettings.findOne({ where: { teamId }, transaction });
  const merged = teamSettingsSchema.parse({ ...toEngineSettings(row), ...input });
  const stored = { ...merged, recoveryWork: JSON.stringify(merged.recoveryWork) };
  if (row) await row.update(stored, { transaction });
  else await TeamLoadSettings.create({ teamId, ...stored }, { transaction });
  return toEngineSettings(merged);
}

/** Sets the ISO weekday the team's week starts on; 404 when the team does not exist. */
export async function updateTeamWeekStart({
  teamId,
  input,
}: {
  teamId: number;
  input: TeamWeekInput;
}): Promise<TeamWeekInput> {
  const { Team } = await db();
  const [changed] = await Team.update({ weekStartDay: input.weekStartDay }, { where: { id: teamId } });
  if (changed === 0) throw new AppError("not_found", "Not found");
  return { weekStartDay: input.weekStartDay };
}
