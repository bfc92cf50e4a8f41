// The invented demo club. Every name here is made up; any likeness to real people or clubs is chance.
import type { PlyoLevel, Sex } from "@/lib/domain/athletes";

export const DEMO_PASSWORD = "sprint-demo-2026";

export const DEMO_TEAM = {
  name: "Harbour Vale Sprint Club",
  timeZone: "Europe/London",
  weekStartDay: 1,
  // The demo asks its athletes for the daily check-in (migration 013), so the squad's status has some to show.
  checkInsEnabled: true,
};

export const DEMO_STAFF = [
  { name: "Rosalind Achterberg", email: "head.coach@harbourvale.test", role: "head_coach" },
  { name: "Tomasz Quillfeather", email: "coach@harbourvale.test", role: "coach" },
  { name: "Imogen Dervaux", email: "physio@harbourvale.test", role: "physio" },
] as const;

export const DEMO_GROUPS = ["Senior sprint", "Junior sprint", "Hurdles & jumps"] as const;

type DemoAthlete = {
  name: string;
  email?: string;
  group: (typeof DEMO_GROUPS)[number];
  sex: Sex;
  birthDate: string;
  bodyMassKg: number;
  vmaxMs: number;
  tauS: number;
  stepLengthM: number;
  plyoLevel: PlyoLevel;
};

// Plausible values: vmax 8.5–11 m/s, τ about 1.0–1.4 s, top-speed step length about 1.9–2.5 m.
export const DEMO_ATHLETES: DemoAthlete[] = [
  {
    name: "Maya Okafor",
    email: "maya@harbourvale.test",
    group: "Senior sprint",
    sex: "female",
    birthDate: "2002-04-18",
    bodyMassKg: 61.5,
    vmaxMs: 9.72,
    tauS: 1.18,
    stepLengthM: 2.18,
    plyoLevel: "advanced",
  },
  {
    name: "Jonah Pell",
    email: "jonah@harbourvale.test",
    group: "Senior sprint",
    sex: "male",
    birthDate: "2000-09-03",
    bodyMassKg: 78.2,
    vmaxMs: 10.86,
    tauS: 1.24,
    stepLengthM: 2.46,
    plyoLevel: "advanced",
  },
  {
    name: "Saoirse Lindqvist",
    group: "Senior sprint",
    sex: "female",
    birthDate: "2001-01-27",
    bodyMassKg: 58.9,
    vmaxMs: 9.41,
    tauS: 1.12,
    stepLengthM: 2.11,
    plyoLevel: "advanced",
  },
  {
    name: "Dario Mbeki-Hart",
    group: "Senior sprint",
    sex: "male",
    birthDate: "1999-06-11",
    bodyMassKg: 81.0,
    vmaxMs: 10.62,
    tauS: 1.31,
    stepLengthM: 2.41,
    plyoLevel: "intermediate",
  },
  {
    name: "Priya Castellane",
    group: "Senior sprint",
    sex: "female",
    birthDate: "2003-11-30",
    bodyMassKg: 56.4,
    vmaxMs: 9.18,
    tauS: 1.09,
    stepLengthM: 2.05,
    plyoLevel: "intermediate",
  },
  {
    name: "Felix Oduya",
    group: "Junior sprint",
    sex: "male",
    birthDate: "2008-02-14",
    bodyMassKg: 66.3,
    vmaxMs: 9.64,
    tauS: 1.15,
    stepLengthM: 2.2,
    plyoLevel: "intermediate",
  },
  {
    name: "Wren Halloway",
    group: "Junior sprint",
    sex: "female",
    birthDate: "2009-07-22",
    bodyMassKg: 52.1,
    vmaxMs: 8.62,
    tauS: 1.02,
    stepLengthM: 1.94,
    plyoLevel: "beginner",
  },
  {
    name: "Kofi Brannagh",
    group: "Junior sprint",
    sex: "male",
    birthDate: "2008-10-05",
    bodyMassKg: 63.7,
    vmaxMs: 9.35,
    tauS: 1.1,
    stepLengthM: 2.12,
    plyoLevel: "beginner",
  },
  {
    name: "Elsa Marchetti-Wood",
    group: "Junior sprint",
    sex: "female",
    birthDate: "2009-03-09",
    bodyMassKg: 54.8,
    vmaxMs: 8.91,
    tauS: 1.05,
    stepLengthM: 2.0,
    plyoLevel: "beginner",
  },
  {
    name: "Ruben Astley",
    group: "Hurdles & jumps",
    sex: "male",
    birthDate: "2004-05-16",
    bodyMassKg: 74.5,
    vmaxMs: 10.12,
    tauS: 1.21,
    stepLengthM: 2.33,
    plyoLevel: "advanced",
  },
  {
    name: "Noor Vasquez-Lund",
    group: "Hurdles & jumps",
    sex: "female",
    birthDate: "2005-12-02",
    bodyMassKg: 59.6,
    vmaxMs: 9.05,
    tauS: 1.14,
    stepLengthM: 2.06,
    plyoLevel: "intermediate",
  },
  {
    name: "Callum Strettin",
    group: "Hurdles & jumps",
    sex: "male",
    birthDate: "2003-08-25",
    bodyMassKg: 79.9,
    vmaxMs: 10.31,
    tauS: 1.27,
    stepLengthM: 2.38,
    plyoLevel: "advanced",
  },
  {
    name: "Ines Rowbotham",
    group: "Hurdles & jumps",
    sex: "female",
    birthDate: "2006-04-07",
    bodyMassKg: 57.2,
    vmaxMs: 8.84,
    tauS: 1.08,
    stepLengthM: 2.02,
    plyoLevel: "intermediate",
  },
];
