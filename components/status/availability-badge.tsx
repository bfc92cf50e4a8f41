import { Badge, type BadgeTone } from "@/components/ui/badge";
import { AVAILABILITY_LABEL, type AvailabilityLevel } from "@/lib/availability/levels";

const TONE: Record<AvailabilityLevel, BadgeTone> = { full: "steady", modified: "climb", unavailable: "spike" };

/** The athlete's availability level in words (the colour only repeats them). */
export function AvailabilityBadge({ level }: { level: AvailabilityLevel }) {
  return (
    <Badge tone={TONE[level]} className="whitespace-nowrap">
      <span data-testid="availability-level" data-level={level}>
        {AVAILABILITY_LABEL[level]}
      </span>
    </Badge>
  );
}
