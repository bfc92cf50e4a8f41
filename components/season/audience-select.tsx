import { Field, Select } from "@/components/ui/field";
import type { UseFormRegisterReturn } from "react-hook-form";

/** Who a phase or meet is for, as one select value: the whole team, one group ("g:7") or one athlete ("a:12"). */
export type Audience = "team" | `g:${number}` | `a:${number}`;

export type AudienceChoices = {
  groups: { id: number; name: string }[];
  /** Left out where a thing cannot be for one athlete (phases). */
  athletes?: { id: number; name: string }[];
};

export function audienceIds(audience: Audience): { groupId: number | null; athleteId: number | null } {
  if (audience === "team") return { groupId: null, athleteId: null };
  const id = Number(audience.slice(2));
  return audience.startsWith("g:") ? { groupId: id, athleteId: null } : { groupId: null, athleteId: id };
}

export function AudienceSelect({
  id,
  choices,
  registration,
  error,
}: {
  id: string;
  choices: AudienceChoices;
  registration: UseFormRegisterReturn;
  error?: string;
}) {
  return (
    <Field label="For" htmlFor={id} error={error}>
      <Select id={id} {...registration}>
        <option value="team">The whole team</option>
        {choices.groups.length > 0 ? (
          <optgroup label="A training group">
            {choices.groups.map((g) => (
              <option key={g.id} value={`g:${g.id}`}>
                {g.name}
              </option>
            ))}
          </optgroup>
        ) : null}
        {choices.athletes && choices.athletes.length > 0 ? (
          <optgroup label="One athlete">
            {choices.athletes.map((a) => (
              <option key={a.id} value={`a:${a.id}`}>
                {a.name}
              </option>
            ))}
          </optgroup>
        ) : null}
      </Select>
    </Field>
  );
}
