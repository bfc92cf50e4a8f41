import "server-only";
import type { Transaction } from "sequelize";
import { ACWR_METHODS, DEFAULT_TEAM_LOAD_SETTINGS, METRICS, type AcwrMethod, type Metric, type TeamLoadSettings } from "@/lib/load/types";
import { teamSettingsSchema, type TeamSettingsPatch } from "@/lib/validations/team-settings";
import { db, type TeamLoadSettings as SettingsModel } from "@/models";

const FIELDS = ["hsrSpeedMs", "nearMaxPct", "acwrMethod", "acwrMetric", "spikeRatio", "risingRatio", "lowRatio", "weeklyChangeLimitPct", "recoveryHours"] as const;

function isMethod(v: unknown): v is AcwrMethod {
  return (ACWR_METHODS as readonly unknown[]).includes(v);
}
function isMetric(v: unknown): v is Metric {
  return (METRICS as readonly unknown[]).includes(v);
}

/** Engine shape from a stored row; unknown stored strings fall back to the defaults. */
export function toEngineSettings(row: Pick<SettingsModel, (typeof FIELDS)[number]> | null): TeamLoadSettings {
  if (!row) return { ...DEFAULT_TEAM_LOAD_SETTINGS };
  return {
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
export async function getTeamLoadSettings({ teamId, transaction }: { teamId: number; transaction?: Transaction }): Promise<TeamLoadSettings> {
  const { TeamLoadSettings } = await db();
  const row = await TeamLoadSettings.findOne({ where: { teamId }, attributes: [...FIELDS], transaction });
  return toEngineSettings(row);
}

/** Merges a partial change into the team's settings; the merged record must pass teamSettingsSchema (else ZodError → 400). */
export async function updateTeamLoadSettings({ teamId, input }: { teamId: number; input: TeamSettingsPatch }): Promise<TeamLoadSettings> {
  const { TeamLoadSettings, sequelize } = await db();
  return sequelize.transaction(async (transaction) => {
    const row = await TeamLoadSettings.findOne({ where: { teamId }, transaction });
    const merged = teamSettingsSchema.parse({ ...toEngineSettings(row), ...input });
    if (row) await row.update(merged, { transaction });
    else await TeamLoadSettings.create({ teamId, ...merged }, { transaction });
    return toEngineSettings({ ...merged });
  });
}
