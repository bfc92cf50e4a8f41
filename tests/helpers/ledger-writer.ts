// Child process for tests/integration/load-ledger-crash.test.ts: plan and log writes in a loop through the real
// data path until it is killed. Prints one line per committed write.
import { addDays } from "@/lib/dates/plain-date";
import { getLogTarget } from "@/lib/data/logs";
import { createSessions, updateSession } from "@/lib/services/plan-sessions";
import { saveSessionLog } from "@/lib/services/session-logs";
import { createSessionSchema } from "@/lib/validations/plan";

const teamId = Number(process.env.LEDGER_TEAM_ID);
const athleteId = Number(process.env.LEDGER_ATHLETE_ID);
const actorUserId = Number(process.env.LEDGER_ACTOR_ID);
const today = process.env.LEDGER_TODAY!;

async function main() {
  for (let i = 0; ; i++) {
    const input = createSessionSchema.parse({
      from: "blank",
      athleteId,
      date: addDays(today, -40 + (i % 50)),
      startTime: "17:00",
      durationMin: 40 + (i % 5) * 10,
      title: `Loop ${i}`,
      plannedRpe: 4 + (i % 5),
      blocks: [
        {
          kind: "tempo",
          title: "Tempo",
          running: { sets: 1, reps: 6, distanceM: 100, intensityPct: 70, start: "standing", runInM: 0, restSec: 60 },
          drills: [],
          notes: "",
        },
      ],
    });
    const { sessions } = await createSessions({ teamId, actorUserId, input });
    const id = sessions[0]!.id;
    await updateSession({
      teamId,
      actorUserId,
      sessionId: id,
      input: { version: sessions[0]!.version, status: "published" },
    });
    const target = await getLogTarget({ sessionId: id });
    if (target && sessions[0]!.date < today) {
      await saveSessionLog({
        target,
        input: { completion: "yes", rpe: 6, minutes: 45, notes: null, completedReps: null },
        actorUserId,
        today,
      });
    }
    process.stdout.write(`wrote ${i}\n`);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
