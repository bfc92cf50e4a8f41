// Invented test data builders for the load engine tests (no real athletes).
import type {
  AthleteProfile,
  BlockInput,
  LogInput,
  PlyoDrill,
  RunningPrescription,
  SessionInput,
  TeamLoadSettings,
} from "@/lib/load/types";
import { DEFAULT_TEAM_LOAD_SETTINGS } from "@/lib/load/types";

export const PROFILE: AthleteProfile = { vmax: 10, tau: 1, stepLengthM: 2.2, plyoLevel: "intermediate" };
export const SETTINGS: TeamLoadSettings = { ...DEFAULT_TEAM_LOAD_SETTINGS };

function running(overrides: Partial<RunningPrescription> = {}): RunningPrescription {
  return { sets: 1, reps: 1, distanceM: 30, intensityPct: 95, start: "crouch", runInM: 0, restSec: 180, ...overrides };
}

export function runBlock(
  kind: BlockInput["kind"],
  overrides: Partial<RunningPrescription> = {},
  id?: string,
): BlockInput {
  return { id, kind, title: `${kind} block`, running: running(overrides) };
}

export function drill(
  sets: number,
  reps: number,
  contactsPerRep: number,
  intensity: PlyoDrill["intensity"],
  name = "drill",
): PlyoDrill {
  return { name, sets, reps, contactsPerRep, intensity };
}

export function plyoBlock(drills: PlyoDrill[], id?: string): BlockInput {
  return { id, kind: "plyometric", title: "Plyometrics", drills };
}

let counter = 0;

export function session(date: string, overrides: Partial<SessionInput> = {}): SessionInput {
  counter += 1;
  return {
    id: `s${counter}`,
    date,
    startTime: "09:00",
    durationMin: 60,
    plannedRpe: 5,
    status: "published",
    blocks: [],
    ...overrides,
  };
}

export function log(sessionId: string, overrides: Partial<LogInput> = {}): LogInput {
  return { sessionId, completion: "yes", rpe: null, minutes: null, ...overrides };
}

export { mulberry32 } from "@/lib/random";
