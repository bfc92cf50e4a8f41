// Invented squad data for tests and scripts/bench-load.ts: seeded, so every run sees the same numbers.
import { addDays } from "@/lib/dates/plain-date";
import type { AthleteProfile, BlockInput, LogInput, PlyoLevel, SessionInput } from "@/lib/load/types";
import { drill, mulberry32 } from "./fixtures";

const LEVELS: PlyoLevel[] = ["beginner", "intermediate", "advanced"];

function pick<T>(rng: () => number, items: readonly T[]): T {
  return items[Math.floor(rng() * items.length)];
}

// Every block carries both `running` and `drills` (null when unused), as rows from the data layer do.
function blockFor(rng: () => number, id: string): BlockInput {
  return { running: null, drills: null, ...blockBody(rng, id) };
}

function blockBody(rng: () => number, id: string): BlockInput {
  const r = rng();
  if (r < 0.22) {
    return {
      id,
      kind: "acceleration",
      title: "Starts",
      running: {
        sets: 2,
        reps: 3 + Math.floor(rng() * 3),
        distanceM: pick(rng, [10, 20, 30]),
        intensityPct: 95,
        start: pick(rng, ["crouch", "blocks", "standing"] as const),
        runInM: 0,
        restSec: 180,
      },
    };
  }
  if (r < 0.4) {
    return {
      id,
      kind: "max_velocity",
      title: "Flys",
      running: {
        sets: 1,
        reps: 3 + Math.floor(rng() * 3),
        distanceM: pick(rng, [20, 30]),
        intensityPct: 95 + Math.floor(rng() * 5),
        start: "flying",
        runInM: 20 + Math.floor(rng() * 3) * 5,
        restSec: 300,
      },
    };
  }
  if (r < 0.55) {
    return {
      id,
      kind: "speed_endurance",
      title: "Speed endurance",
      running: {
        sets: 1,
        reps: 2 + Math.floor(rng() * 3),
        distanceM: pick(rng, [80, 120, 150]),
        intensityPct: 85 + Math.floor(rng() * 8),
        start: "standing",
        runInM: 0,
        restSec: 480,
      },
    };
  }
  if (r < 0.7) {
    return {
      id,
      kind: "tempo",
      title: "Tempo",
      running: {
        sets: 2,
        reps: 5,
        distanceM: 100,
        intensityPct: 65 + Math.floor(rng() * 10),
        start: "standing",
        runInM: 0,
        restSec: 60,
      },
    };
  }
  if (r < 0.88) {
    return {
      id,
      kind: "plyometric",
      title: "Plyometrics",
      drills: [
        drill(2 + Math.floor(rng() * 3), 8 + Math.floor(rng() * 5), 1, "low", "pogo hops"),
        drill(3, 6, pick(rng, [1, 2]), pick(rng, ["moderate", "high"] as const), "bounds"),
      ],
    };
  }
  return { id, kind: pick(rng, ["strength", "recovery"] as const), title: "Gym" };
}

export interface SynthAthlete {
  id: string;
  name: string;
  group: string;
  profile: AthleteProfile;
  sessions: SessionInput[];
  logs: LogInput[];
}

/** About 5 sessions a week from `start` for `days` days; sessions up to `today` are logged 85% of the time. */
export function synthAthlete(seed: number, start: string, days: number, today: string): SynthAthlete {
  const rng = mulberry32(seed);
  const sessions: SessionInput[] = [];
  const logs: LogInput[] = [];
  for (let d = 0; d < days; d++) {
    if (rng() > 5 / 7) continue;
    const date = addDays(start, d);
    const id = `a${seed}-s${d}`;
    const blocks = Array.from({ length: 2 + Math.floor(rng() * 3) }, (_, k) => blockFor(rng, `${id}-b${k}`));
    sessions.push({
      id,
      date,
      startTime: pick(rng, ["07:30", "09:00", "16:00", "17:30"]),
      durationMin: 45 + Math.floor(rng() * 6) * 10,
      plannedRpe: 3 + Math.floor(rng() * 6),
      status: rng() < 0.03 ? "cancelled" : rng() < 0.05 ? "draft" : "published",
      blocks,
    });
    if (date <= today && rng() < 0.85) {
      const c = rng();
      logs.push({
        sessionId: id,
        completion: c < 0.8 ? "yes" : c < 0.95 ? "partly" : "no",
        rpe: rng() < 0.9 ? 3 + Math.floor(rng() * 7) : null,
        minutes: rng() < 0.9 ? 40 + Math.floor(rng() * 50) : null,
        completedReps: rng() < 0.1 ? { [blocks[0].id ?? ""]: Math.floor(rng() * 6) } : null,
      });
    }
  }
  return {
    id: `ath-${seed}`,
    name: `Athlete ${seed}`,
    group: pick(rng, ["Short sprint", "Long sprint", "Hurdles"]),
    profile: {
      vmax: 8.5 + rng() * 2,
      tau: 0.9 + rng() * 0.5,
      stepLengthM: rng() < 0.2 ? null : 2 + rng() * 0.5,
      plyoLevel: pick(rng, LEVELS),
    },
    sessions,
    logs,
  };
}
