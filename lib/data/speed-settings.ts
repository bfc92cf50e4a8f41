import "server-only";
import { DEFAULT_RETEST_WEEKS } from "@/lib/speed/retest";
import { db } from "@/models";
import { inTeamTransaction } from "./transaction";

// The speed lab's team settings (speed_lab_settings, migration 015): a team without a row uses the defaults.

export type SpeedLabSettingsDto = { retestWeeks: number };

export async function getSpeedLabSettings({ teamId }: { teamId: number }): Promise<SpeedLabSettingsDto> {
  const { SpeedLabSettings } = await db();
  const row = await SpeedLabSettings.findByPk(teamId, { attributes: ["retestWeeks"], raw: true });
  return { retestWeeks: row?.retestWeeks ?? DEFAULT_RETEST_WEEKS };
}

/** Writes the team's row (created on the first save); the last of two concurrent saves wins, never a 500. */
export async function saveSpeedLabSettings({
  teamId,
  input,
}: {
  teamId: number;
  input: SpeedLabSettingsDto;
}): Promise<SpeedLabSettingsDto> {
  const { SpeedLabSettings } = await db();
  return inTeamTransaction(teamId, async (transaction) => {
    await SpeedLabSettings.upsert({ teamId, retestWeeks: input.retestWeeks }, { transaction });
    return { retestWeeks: input.retestWeeks };
  });
}
