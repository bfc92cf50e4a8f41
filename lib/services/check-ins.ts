import "server-only";
import { getAthleteReportSettings } from "@/lib/data/athlete-report-settings";
import { writeCheckIn, type CheckInDto } from "@/lib/data/check-ins";
import { inTeamTransaction } from "@/lib/data/transaction";
import { AppError } from "@/lib/errors";
import type { CheckInInput } from "@/lib/validations/athlete-reports";

/** Today's check-in for the athlete (a second one the same day replaces the first); only when the team asks. */
export async function saveCheckIn({
  teamId,
  athleteId,
  today,
  input,
}: {
  teamId: number;
  athleteId: number;
  today: string;
  input: CheckInInput;
}): Promise<CheckInDto> {
  return inTeamTransaction(teamId, async (transaction) => {
    const settings = await getAthleteReportSettings({ teamId, transaction });
    if (!settings.checkInsEnabled)
      throw new AppError("conflict", "Daily check-ins are turned off for this team", {
        fields: { checkIn: ["Your head coach has not turned the daily check-in on"] },
      });
    return writeCheckIn({ teamId, athleteId, date: today, scores: input, transaction });
  });
}
