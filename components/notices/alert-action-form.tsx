"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { alertActionSchema, type AlertActionFormValues, type AlertActionInput } from "@/lib/validations/alerts";
import { noticeApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import type { AlertRow } from "@/lib/data/alerts";

type Action = AlertActionInput["action"];

const LABEL: Record<Action, string> = { acknowledge: "Acknowledge", resolve: "Resolve", reopen: "Reopen" };

/** One action on an alert with its note; resolving needs the note (what was done). */
export function AlertActionForm({
  alert,
  action,
  onDone,
  onCancel,
}: {
  alert: AlertRow;
  action: Action;
  onDone: (a: AlertRow) => void;
  onCancel: () => void;
}) {
  const { register, handleSubmit, setError, formState } = useForm<AlertActionFormValues, unknown, AlertActionInput>({
    resolver: zodResolver(alertActionSchema),
    defaultValues: { action, note: action === "resolve" ? "" : undefined },
  });
  const id = `alert-${alert.id}-note`;
  const submit = handleSubmit(async (values) => {
    try {
      const { alert: updated } = await noticeApi.act(alert.id, values);
      onDone(updated);
    } catch (err) {
      // The note is the form's only field: a refusal without a message for it is still shown under it.
      if (!applyServerErrors({ setError }, err, ["note"]))
        setError("note", { message: err instanceof ApiError ? err.message : "Could not save; try again" });
    }
  });
  return (
    <form
      onSubmit={submit}
      className="mt-3 space-y-3 rounded-lg bg-paper-sunk p-3"
      data-testid={`alert-${action}-form`}
    >
      <input type="hidden" {...register("action")} />
      <Field
        label={action === "resolve" ? "How was it handled?" : "Note (optional)"}
        htmlFor={id}
        error={formState.errors.note?.message}
      >
        <Textarea
          id={id}
          rows={2}
          aria-invalid={Boolean(formState.errors.note)}
          placeholder={action === "resolve" ? "e.g. Talked to the coach; Tuesday's volume halved" : ""}
          {...register("note")}
        />
      </Field>
      <div className="flex gap-2">
        <Button type="submit" size="sm" disabled={formState.isSubmitting}>
          {LABEL[action]}
        </Button>
        <Button type="button" size="sm" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
