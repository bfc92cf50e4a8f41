import { formatDayShort } from "@/lib/format/dates";
import { findSession, type DropTarget, type PlanChange } from "@/lib/plan/drop";
import type { PlanWeek } from "@/lib/plan/types";

const nameOf = (week: PlanWeek, id: number) => week.athletes.find((a) => a.id === id)?.name ?? "athlete";
const templateOf = (week: PlanWeek, id: number) => week.templates.find((t) => t.id === id)?.title ?? "block";

export function targetLabel(week: PlanWeek, t: DropTarget): string {
  if (t.type === "group")
    return `the whole ${week.groups.find((g) => g.id === t.groupId)?.name ?? ""} group on ${formatDayShort(t.date)}`;
  return `${nameOf(week, t.athleteId)}'s ${formatDayShort(t.date)}`;
}

/** A change in words: "Flying 30s added to Maya Brook's Tue 3 Mar". */
export function describeChange(week: PlanWeek, c: PlanChange): string {
  switch (c.kind) {
    case "create":
      return `new session "${templateOf(week, c.templateId)}" on ${nameOf(week, c.athleteId)}'s ${formatDayShort(c.date)}`;
    case "add-block":
      return `"${templateOf(week, c.templateId)}" added to ${nameOf(week, c.athleteId)}'s session on ${formatDayShort(c.date)}`;
    case "group":
      return (
        `"${templateOf(week, c.templateId)}" for ${c.targets.length} athletes of ` +
        `${week.groups.find((g) => g.id === c.groupId)?.name ?? "the group"} on ${formatDayShort(c.date)}`
      );
    case "move":
      return `"${findSession(week, c.sessionId)?.title ?? "session"}" moved to ${nameOf(week, c.athleteId)}'s ${formatDayShort(c.date)}`;
    case "copy":
      return `copy of "${findSession(week, c.sessionId)?.title ?? "session"}" on ${nameOf(week, c.athleteId)}'s ${formatDayShort(c.date)}`;
  }
}
