import "server-only";
import { insertAthlete, updateAthleteRow } from "@/lib/data/athletes";
import { refreshLedger } from "@/lib/data/ledger";
import { inTeamTransaction } from "@/lib/data/transaction";
import type { AthleteInput } from "@/lib/validations/athlete";

// Profile writes (the values the engine reads: vmax, τ, step length, plyometric level, group). Derived state
// that follows a profile (the load ledger) is brought up to date here, inside the same transaction.

export async function createAthlete({
  teamId,
  input,
}: {
  teamId: number;
  input: AthleteInput;
}): Promise<{ id: number }> {
  return inTeamTransaction(teamId, (transaction) => insertAthlete({ teamId, input, transaction }));
}

export async function updateAthlete({
  teamId,
  athleteId,
  input,
}: {
  teamId: number;
  athleteId: number;
  input: AthleteInput;
}): Promise<{ id: number }> {
  return inTeamTransaction(teamId, async (transaction) => {
    const row = await updateAthleteRow({ teamId, athleteId, input, transaction });
    // vmax, τ, step length and plyo level change every day of the athlete's ledger.
    await refreshLedger({ transaction });
    return row;
  });
}
