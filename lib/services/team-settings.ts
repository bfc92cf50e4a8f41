import "server-only";
import { writeTeamLoadSettings } from "@/lib/data/team-settings";
import { refreshLedger } from "@/lib/data/ledger";
import { inTeamTransaction } from "@/lib/data/transaction";
import type { TeamLoadSettings } from "@/lib/load/types";
import type { TeamSettingsPatch } from "@/lib/validations/team-settings";

// Threshold writes: every change of the team's load settings goes through here (derived state such as the load
// ledger is brought up to date in the same transaction).

/** Merges a partial change into the team's settings; the merged record must pass teamSettingsSchema (else 400). */
export async function updateTeamLoadSettings({
  teamId,
  input,
}: {
  teamId: number;
  input: TeamSettingsPatch;
}): Promise<TeamLoadSettings> {
  return inTeamTransaction(teamId, async (transaction) => {
    const settings = await writeTeamLoadSettings({ teamId, input, transaction });
    // Thresholds, speed zones, the ACWR method and the missing-log rule are in every ledger row of the team.
    await refreshLedger({ transaction });
    return settings;
  });
}
