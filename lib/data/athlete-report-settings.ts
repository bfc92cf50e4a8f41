import "server-only";
import type { Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import type { AthleteReportSettingsInput } from "@/lib/validations/athlete-reports";
import { db } from "@/models";

/** The team's line for pain alerts and whether athletes are asked for the daily check-in (migration 013). */
export type AthleteReportSettings = { painAlertAbove: number; checkInsEnabled: boolean };

export async function getAthleteReportSettings({
  teamId,
  transaction,
}: {
  teamId: number;
  transaction?: Transaction;
}): Promise<AthleteReportSettings> {
  const { Team } = await db();
  const team = await Team.findByPk(teamId, { attributes: ["painAlertAbove", "checkInsEnabled"], transaction });
  if (!team) throw new AppError("not_found", "Not found");
  return { painAlertAbove: team.painAlertAbove, checkInsEnabled: Boolean(team.checkInsEnabled) };
}

export async function updateAthleteReportSettings({
  teamId,
  input,
}: {
  teamId: number;
  input: AthleteReportSettingsInput;
}): Promise<AthleteReportSettings> {
  const { Team } = await db();
  const patch = {
    ...(input.painAlertAbove !== undefined ? { painAlertAbove: input.painAlertAbove } : {}),
    ...(input.checkInsEnabled !== undefined ? { checkInsEnabled: input.checkInsEnabled } : {}),
  };
  const [changed] = await Team.update(patch, { where: { id: teamId } });
  if (changed === 0) throw new AppError("not_found", "Not found");
  return getAthleteReportSettings({ teamId });
}
