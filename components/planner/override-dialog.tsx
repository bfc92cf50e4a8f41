"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { createContext, useCallback, useContext, useState, type ReactNode } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { formatDayShort } from "@/lib/format/dates";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import { overrideSchema, type OverrideInput } from "@/lib/validations/plan";
import { Dialog } from "./dialog";

type OverrideRequest = { hits: readonly RestrictionHit[]; what: string; athleteName: (id: number) => string };
type Ask = (request: OverrideRequest) => Promise<string | null>;
type Pending = OverrideRequest & { resolve: (reason: string | null) => void };

const OverrideContext = createContext<Ask>(async () => null);

/** Asks the coach why a change should go past a physio restriction; null when they keep the plan as it was. */
export function useOverrideReason(): Ask {
  return useContext(OverrideContext);
}

export function OverrideProvider({ children }: { children: ReactNode }) {
  const [pending, setPending] = useState<Pending | null>(null);
  const ask = useCallback<Ask>(
    (request) => new Promise<string | null>((resolve) => setPending({ ...request, resolve })),
    [],
  );
  const settle = (reason: string | null) => {
    pending?.resolve(reason);
    setPending(null);
  };
  return (
    <OverrideContext.Provider value={ask}>
      {children}
      <Dialog
        open={pending !== null}
        onClose={() => settle(null)}
        title="This goes past a physio restriction"
        testId="override-dialog"
      >
        {pending ? <OverrideForm request={pending} onDone={settle} /> : null}
      </Dialog>
    </OverrideContext.Provider>
  );
}

function OverrideForm({ request, onDone }: { request: OverrideRequest; onDone: (reason: string | null) => void }) {
  const { register, handleSubmit, formState } = useForm<OverrideInput>({
    resolver: zodResolver(overrideSchema),
    defaultValues: { reason: "" },
  });
  const people = [...new Set(request.hits.map((h) => request.athleteName(h.athleteId)))];
  const whom = people.length === 1 ? people[0] : "these athletes";
  return (
    <form onSubmit={handleSubmit((v) => onDone(v.reason))} noValidate className="space-y-4">
      <p className="text-sm text-ink-600">
        The medical staff limited what {whom} should do. You can still plan {request.what}; your reason is kept with the
        session and sent to the medical staff.
      </p>
      <ul className="space-y-2">
        {request.hits.map((h) => (
          <li
            key={`${h.restrictionId}:${h.date}`}
            data-testid="override-hit"
            className="rounded-md border border-dashed border-limit bg-limit-soft px-3 py-2 text-sm"
          >
            <span className="font-semibold text-ink-900">
              {request.athleteName(h.athleteId)} · {formatDayShort(h.date)}
            </span>
            <span className="block text-ink-700">{h.rule}</span>
            <span className="block text-xs text-ink-600">In the session: {h.detail}</span>
            {h.note ? (
              <span className="mt-1 block text-xs text-ink-600 italic">
                “{h.note}” · {h.setByName}
              </span>
            ) : null}
          </li>
        ))}
      </ul>
      <Field label="Why should it go ahead?" htmlFor="override-reason" error={formState.errors.reason?.message}>
        <Textarea
          id="override-reason"
          rows={3}
          autoFocus
          placeholder="e.g. Cleared by the physio at today's check; flys capped at 20 m."
          aria-invalid={formState.errors.reason ? true : undefined}
          {...register("reason")}
          data-testid="override-reason"
        />
      </Field>
      <div className="flex flex-wrap justify-end gap-2">
        <Button type="button" variant="secondary" onClick={() => onDone(null)} data-testid="override-cancel">
          Keep the plan as it was
        </Button>
        <Button type="submit" data-testid="override-confirm">
          Plan it anyway
        </Button>
      </div>
    </form>
  );
}
