// The datasets and targets of `npm run bench:scale` (issue 12), shared by the runner and the generator.

export type BenchDataset = { key: string; label: string; today: string } & (
  { kind: "demo" } | { kind: "clubs"; clubs: number; athletes: number; seasons: number }
);

/** What the generator leaves beside each database for the runner. */
export type BenchMeta = {
  teamId: number;
  headCoachEmail: string;
  /** The measured athlete: the demo's first athlete with an account, or a club's first athlete. */
  athleteId: number;
  feedToken: string;
  sessions: number;
  seedMs: number;
};

export function datasets(today: string, quick: boolean): BenchDataset[] {
  const all: BenchDataset[] = [
    { key: "demo", label: "demo, 13 athletes", kind: "demo", today },
    { key: "60x1", label: "60 athletes × 1 season", kind: "clubs", clubs: 1, athletes: 60, seasons: 1, today },
    { key: "60x3", label: "60 athletes × 3 seasons", kind: "clubs", clubs: 1, athletes: 60, seasons: 3, today },
    { key: "60x5", label: "60 athletes × 5 seasons", kind: "clubs", clubs: 1, athletes: 60, seasons: 5, today },
    {
      key: "20x30x2",
      label: "20 clubs × 30 athletes × 2 seasons",
      kind: "clubs",
      clubs: 20,
      athletes: 30,
      seasons: 2,
      today,
    },
  ];
  return quick ? all.filter((s) => s.key === "demo" || s.key === "60x1") : all;
}

export type Endpoint = "floor" | "squad" | "plan" | "athlete" | "page" | "feed" | "feed304" | "drop";

/** The targets that one figure can be held against (the flat-in-history ones are checked across sets). */
export function targetFor(
  set: string,
  e: Endpoint,
): {
  text: string;
  met: (r: { share: number; p50: number; p95: number; p99: number; errors: number; status304?: boolean }) => boolean;
} | null {
  const big = set === "60x5" || set === "20x30x2";
  if (e === "drop" && set === "60x5") return { text: "p95 < 150 ms", met: (r) => r.p95 < 150 && r.errors === 0 };
  if (e === "feed" && set === "60x5") return { text: "p50 < 30 ms", met: (r) => r.p50 < 30 && r.errors === 0 };
  if (e === "feed304" && set === "60x5")
    return { text: "304 unchanged", met: (r) => r.status304 === true && r.errors === 0 };
  if (!big) return null;
  if (e === "page")
    return { text: "≥ 10 %, p99 < 600 ms", met: (r) => r.share >= 0.1 && r.p99 < 600 && r.errors === 0 };
  if (e === "squad" || e === "plan" || e === "athlete" || e === "feed") {
    return { text: "≥ 25 %, p99 < 250 ms", met: (r) => r.share >= 0.25 && r.p99 < 250 && r.errors === 0 };
  }
  return null;
}
