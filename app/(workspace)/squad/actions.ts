"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { runAction } from "@/lib/action-result";
import { requireAthlete, requireMember, requireViewer } from "@/lib/auth/access";
import { createAthlete, updateAthlete } from "@/lib/services/athletes";
import { athleteSchema, type AthleteFormValues } from "@/lib/validations/athlete";

export async function saveAthleteAction(athleteId: number | null, input: AthleteFormValues) {
  return runAction(async () => {
    const parsed = athleteSchema.parse(input);
    if (athleteId === null) {
      const viewer = await requireViewer();
      await requireMember({ teamId: viewer.teamId, can: "athletes:edit" });
      const created = await createAthlete({ teamId: viewer.teamId, input: parsed });
      revalidatePath("/squad");
      return created;
    }
    const viewer = await requireAthlete({
      athleteId: z.number().int().positive().parse(athleteId),
      can: "athletes:edit",
    });
    const updated = await updateAthlete({ teamId: viewer.teamId, athleteId: viewer.athlete.id, input: parsed });
    revalidatePath("/squad");
    revalidatePath(`/squad/${athleteId}`);
    return updated;
  });
}
