import { drillContacts } from "@/lib/load/plyo";
import type { BlockInput, BlockKind, PlyoDrill, RunningPrescription } from "@/lib/load/types";
import { formatRest } from "./duration";
import { formatNumber, plural } from "./number";

export const BLOCK_KIND_LABEL: Record<BlockKind, string> = {
  acceleration: "Acceleration",
  max_velocity: "Max velocity",
  plyometric: "Plyometrics",
  speed_endurance: "Speed endurance",
  tempo: "Tempo",
  strength: "Strength",
  recovery: "Recovery",
};

// Which kind names a mixed session: the most demanding sprint quality first, recovery last.
const KIND_PRIORITY: readonly BlockKind[] = [
  "max_velocity",
  "acceleration",
  "speed_endurance",
  "plyometric",
  "tempo",
  "strength",
  "recovery",
];

/** The kind a session is "about", or null for a session without blocks. */
export function mainBlockKind(blocks: readonly Pick<BlockInput, "kind">[]): BlockKind | null {
  for (const kind of KIND_PRIORITY) if (blocks.some((b) => b.kind === kind)) return kind;
  return null;
}

const START_SHORT: Record<RunningPrescription["start"], string> = {
  standing: "standing start",
  crouch: "crouch start",
  blocks: "from blocks",
  flying: "flying",
};

const START_PHRASE: Record<RunningPrescription["start"], string> = {
  standing: "from a standing start",
  crouch: "from a crouch start",
  blocks: "from blocks",
  flying: "from a flying start",
};

function hasRunIn(run: RunningPrescription): boolean {
  return run.start === "flying" && run.runInM > 0;
}

function runningSummary(run: RunningPrescription): string {
  const sets = run.sets > 1 ? `${run.sets} sets of ` : "";
  const runIn = hasRunIn(run) ? ` (${formatNumber(run.runInM)} m run-in)` : "";
  return `${sets}${run.reps} × ${formatNumber(run.distanceM)} m ${START_SHORT[run.start]}${runIn} · ${formatNumber(run.intensityPct)}%`;
}

function firstLine(text: string, max = 60): string {
  const line = text.trim().split(/\r?\n/)[0]?.trim() ?? "";
  return line.length > max ? `${line.slice(0, max - 1).trimEnd()}…` : line;
}

/** Short card text: "4 × 30 m flying (20 m run-in) · 95%" or "3 drills · 86 contacts". */
export function blockSummary(block: BlockInput): string {
  const parts: string[] = [];
  if (block.running) parts.push(runningSummary(block.running));
  if (block.drills && block.drills.length > 0) {
    const contacts = drillContacts(block.drills);
    parts.push(`${plural(block.drills.length, "drill")} · ${plural(contacts, "contact")}`);
  }
  if (parts.length > 0) return parts.join(" · ");
  return (block.notes && firstLine(block.notes)) || BLOCK_KIND_LABEL[block.kind];
}

function runningSentence(run: RunningPrescription): string {
  const sets = run.sets > 1 ? `${run.sets} sets of ` : "";
  const runIn = hasRunIn(run) ? ` with a ${formatNumber(run.runInM)} m run-in` : "";
  const rest = run.restSec > 0 ? `, ${formatRest(run.restSec)} rest` : "";
  return (
    `${sets}${run.reps} × ${formatNumber(run.distanceM)} m ${START_PHRASE[run.start]}${runIn}` +
    ` at ${formatNumber(run.intensityPct)}% of top speed${rest}`
  );
}

function drillLine(drill: PlyoDrill): string {
  const each = drill.contactsPerRep === 1 ? "" : ` (${plural(drill.contactsPerRep, "contact")} each)`;
  const contacts = plural(drillContacts([drill]), "contact");
  return `• ${drill.name}: ${drill.sets} × ${drill.reps}${each}, ${drill.intensity} intensity, ${contacts}`;
}

/**
 * A few plain lines a person reads on a phone, e.g.
 * "Max velocity: 2 sets of 3 × 30 m from a flying start with a 20 m run-in at 95% of top speed, 4 min rest".
 */
export function blockDescription(block: BlockInput): string[] {
  const label = BLOCK_KIND_LABEL[block.kind];
  const title = block.title.trim();
  const heading = title && title.toLowerCase() !== label.toLowerCase() ? `${label} – ${title}` : label;
  const lines: string[] = [];
  const drills = block.drills ?? [];

  if (block.running) lines.push(`${heading}: ${runningSentence(block.running)}`);
  if (drills.length > 0) {
    const contacts = drillContacts(drills);
    const intro = `${plural(drills.length, "drill")}, ${plural(contacts, "ground contact")} in total`;
    lines.push(block.running ? `Plus ${intro}:` : `${heading}: ${intro}:`);
    for (const drill of drills) lines.push(drillLine(drill));
  }
  if (lines.length === 0) lines.push(heading);
  const notes = (block.notes ?? "")
    .split(/\r?\n/)
    .map((n) => n.trim())
    .filter(Boolean);
  notes.forEach((note, i) => lines.push(i === 0 ? `Note: ${note}` : note));
  return lines;
}
