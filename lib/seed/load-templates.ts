import type { RunningPrescription } from "@/lib/load/types";
import type { BlockTemplate } from "@/models";

// The demo team's shelf of blocks. Volumes are typical of sprint coaching practice (common practice, invented
// here); contacts count one per landing of one foot or both feet together (NSCA).

export type DemoTemplate = { key: TemplateKey } & Pick<
  BlockTemplate,
  "kind" | "title" | "running" | "drills" | "notes" | "durationMin" | "plannedRpe"
>;

export type TemplateKey =
  | "blockStarts"
  | "crouchAccel"
  | "flying30"
  | "speedEndurance"
  | "tempo"
  | "plyoLow"
  | "plyoModerate"
  | "plyoHigh"
  | "strength"
  | "recovery";

const run = (
  sets: number,
  reps: number,
  distanceM: number,
  intensityPct: number,
  start: RunningPrescription["start"],
  restSec: number,
  runInM = 0,
): RunningPrescription => ({
  sets,
  reps,
  distanceM,
  intensityPct,
  start,
  runInM,
  restSec,
});

export const DEMO_TEMPLATES: DemoTemplate[] = [
  {
    key: "blockStarts",
    kind: "acceleration",
    title: "Block starts 6 × 20 m",
    running: run(1, 6, 20, 95, "blocks", 180),
    drills: null,
    notes: "Full recovery; walk back.",
    durationMin: 60,
    plannedRpe: 6,
  },
  {
    key: "crouchAccel",
    kind: "acceleration",
    title: "Crouch accelerations 2 × 3 × 30 m",
    running: run(2, 3, 30, 95, "crouch", 180),
    drills: null,
    notes: "5 min between sets.",
    durationMin: 60,
    plannedRpe: 6,
  },
  {
    key: "flying30",
    kind: "max_velocity",
    title: "Flying 30s, 20 m run-in",
    running: run(1, 4, 30, 95, "flying", 300, 20),
    drills: null,
    notes: "Build through the run-in; hold form through the zone.",
    durationMin: 70,
    plannedRpe: 8,
  },
  {
    key: "speedEndurance",
    kind: "speed_endurance",
    title: "Speed endurance 3 × 150 m",
    running: run(1, 3, 150, 88, "standing", 600),
    drills: null,
    notes: "10 min walk recovery.",
    durationMin: 70,
    plannedRpe: 8,
  },
  {
    key: "tempo",
    kind: "tempo",
    title: "Tempo 8 × 100 m",
    running: run(1, 8, 100, 70, "standing", 60),
    drills: null,
    notes: "Grass if available; walk the bend.",
    durationMin: 45,
    plannedRpe: 4,
  },
  {
    key: "plyoLow",
    kind: "plyometric",
    title: "Plyo circuit · low",
    running: null,
    drills: [
      { name: "Pogo hops", sets: 3, reps: 10, contactsPerRep: 1, intensity: "low" },
      { name: "Ankle hops", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" },
      { name: "Line hops", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" },
    ],
    notes: null,
    durationMin: 25,
    plannedRpe: 4,
  },
  {
    key: "plyoModerate",
    kind: "plyometric",
    title: "Plyo circuit · moderate",
    running: null,
    drills: [
      { name: "Hurdle hops", sets: 4, reps: 6, contactsPerRep: 1, intensity: "moderate" },
      { name: "Box jumps", sets: 4, reps: 5, contactsPerRep: 1, intensity: "moderate" },
      { name: "Skips for height", sets: 3, reps: 10, contactsPerRep: 1, intensity: "low" },
    ],
    notes: "Step down from the box.",
    durationMin: 30,
    plannedRpe: 6,
  },
  {
    key: "plyoHigh",
    kind: "plyometric",
    title: "Plyo circuit · high",
    running: null,
    drills: [
      { name: "Depth jumps (30 cm)", sets: 3, reps: 5, contactsPerRep: 2, intensity: "high" },
      { name: "Alternate-leg bounds", sets: 4, reps: 1, contactsPerRep: 10, intensity: "high" },
      { name: "Single-leg hops", sets: 2, reps: 2, contactsPerRep: 5, intensity: "high" },
    ],
    notes: "Quality over quantity: stop when contacts get long.",
    durationMin: 30,
    plannedRpe: 7,
  },
  {
    key: "strength",
    kind: "strength",
    title: "Strength · lower body",
    running: null,
    drills: null,
    notes: "Trap-bar deadlift, split squat, Nordic curls, calf raises.",
    durationMin: 60,
    plannedRpe: 6,
  },
  {
    key: "recovery",
    kind: "recovery",
    title: "Recovery · mobility and easy bike",
    running: null,
    drills: null,
    notes: "Keep it easy: conversation pace.",
    durationMin: 30,
    plannedRpe: 2,
  },
];
