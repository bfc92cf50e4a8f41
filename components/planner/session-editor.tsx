"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { FormProvider, useFieldArray, useForm, useWatch } from "react-hook-form";
import { currentOf } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { BLOCK_KIND_LABEL, blockDescription, blockSummary } from "@/lib/format/block-summary";
import { formatDayLong } from "@/lib/format/dates";
import { formatMinutes } from "@/lib/format/duration";
import { toBlockInput } from "@/lib/plan/blocks";
import { newPlausibilityChecks, type PlausibilityCheck } from "@/lib/plan/plausibility";
import type { PlanSession, PlanTemplate } from "@/lib/plan/types";
import type { PlanMeasured } from "@/lib/speed/plan-measured";
import { sessionEditSchema, type SessionEditValues } from "@/lib/validations/plan";
import { SessionThread } from "@/components/sessions/session-thread";
import { PlanMeasuredTable } from "@/components/speed/plan-measured-table";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { BlockFields } from "./block-fields";
import { removeQuestion, useConfirm } from "./confirm";
import { Dialog } from "./dialog";
import { FormFooter } from "./form-footer";

type Props = {
  session: PlanSession | null;
  athleteName: string;
  /** The session's speed trace against its plan, when one is attached (staff). */
  measured?: PlanMeasured | null;
  canEdit: boolean;
  templates: PlanTemplate[];
  onClose: () => void;
  onSave: (s: PlanSession, values: SessionEditValues, version: number, goAhead?: { confirmed?: true }) => Promise<void>;
  /** "Are you sure?" with the numbers past a plausibility limit (the planner's dialog). */
  askSure: (checks: PlausibilityCheck[], what: string) => Promise<boolean>;
  onDelete: (s: PlanSession, version: number) => Promise<void>;
};

function toEditValues(s: PlanSession): SessionEditValues {
  return {
    title: s.title,
    startTime: s.startTime,
    durationMin: s.durationMin,
    plannedRpe: s.plannedRpe,
    notes: s.notes ?? "",
    blocks: s.blocks.map(({ templateId, kind, title, running, drills, notes }) => ({
      templateId,
      kind,
      title,
      running,
      drills,
      notes: notes ?? "",
    })),
  };
}

/** Click a card: its blocks, time, duration, planned RPE and notes, or delete it. Read-only for physios and athletes. */
export function SessionEditor(props: Props) {
  const { session, athleteName, onClose } = props;
  const title = session ? `${athleteName} · ${formatDayLong(session.date)}` : "Session";
  return (
    <Dialog open={session !== null} onClose={onClose} title={title} wide testId="session-editor">
      {session ? (
        props.canEdit && session.status !== "cancelled" ? (
          <EditForm key={`${session.id}:${session.version}`} {...props} session={session} />
        ) : (
          <SessionDetails session={session} />
        )
      ) : null}
      {session && props.measured ? (
        <section className="mt-5 border-t border-ink-100 pt-4" data-testid="session-measured">
          <h3 className="text-sm font-semibold text-ink-900">Measured by a speed trace</h3>
          <PlanMeasuredTable m={props.measured} caption="Planned against measured running load" />
        </section>
      ) : null}
      {/* Whoever plans may reopen a closed log (plan:edit and log:unlock go together, tests/unit/auth/permissions). */}
      {session ? (
        <SessionThread sessionId={session.id} canReopen={props.canEdit} className="mt-5 border-t border-ink-100 pt-4" />
      ) : null}
    </Dialog>
  );
}

function SessionDetails({ session: s }: { session: PlanSession }) {
  return (
    <div className="space-y-3 text-sm" data-testid="session-details">
      <p className="text-ink-600">
        {s.startTime} · {formatMinutes(s.durationMin)} · planned RPE {s.plannedRpe} ·{" "}
        {s.status === "draft" ? "draft" : s.status}
      </p>
      <h3 className="text-base font-semibold text-ink-900">{s.title}</h3>
      {s.blocks.map((b) => (
        <div key={b.id} className="rounded-lg bg-paper-sunk/60 p-3">
          {blockDescription(toBlockInput(b)).map((line, i) => (
            <p key={i} className={i === 0 ? "font-medium text-ink-800" : "text-ink-600"}>
              {line}
            </p>
          ))}
        </div>
      ))}
      {s.notes ? <p className="whitespace-pre-line text-ink-600">{s.notes}</p> : null}
    </div>
  );
}

/** The limits the edited blocks go past that the saved session did not (the server asks the same). */
function checksOf(session: PlanSession, blocks: SessionEditValues["blocks"] | undefined): PlausibilityCheck[] {
  if (!blocks) return [];
  try {
    return newPlausibilityChecks({ blocks: session.blocks.map(toBlockInput) }, { blocks: blocks.map(toBlockInput) });
  } catch {
    return []; // a half-typed block (a field cleared) has no numbers to check yet
  }
}

function EditForm({ session, templates, onClose, onSave, onDelete, askSure }: Props & { session: PlanSession }) {
  const confirm = useConfirm();
  const form = useForm<SessionEditValues>({
    resolver: zodResolver(sessionEditSchema),
    defaultValues: toEditValues(session),
  });
  const blocks = useFieldArray({ control: form.control, name: "blocks" });
  const [open, setOpen] = useState<number | null>(session.blocks.length === 1 ? 0 : null);
  const [version, setVersion] = useState(session.version);
  const [notice, setNotice] = useState<string | null>(null);
  const [addFrom, setAddFrom] = useState<string>("");

  const handleError = (e: unknown) => {
    const current = e instanceof ApiError && e.stale ? currentOf(e) : null;
    if (current) {
      setVersion(current.version);
      setNotice(
        "This session was changed by someone else while you were editing " +
          `(it is now "${current.title}" at ${current.startTime}, ${current.blocks.length} blocks). ` +
          "Save again to replace it with what you see here, or close to keep their version.",
      );
      return;
    }
    applyServerErrors(form, e);
    setNotice(e instanceof Error ? e.message : "Could not save the session");
  };
  const submit = form.handleSubmit(async (values) => {
    setNotice(null);
    const checks = checksOf(session, values.blocks);
    // Asked here, before sending, with the same checks the server runs; the server still asks if we did not.
    if (checks.length > 0 && !(await askSure(checks, `the changes to "${values.title}"`))) return;
    try {
      await onSave(session, values, version, checks.length > 0 ? { confirmed: true } : {});
      onClose();
    } catch (e) {
      handleError(e);
    }
  });
  const err = form.formState.errors;
  const watched = useWatch({ control: form.control, name: "blocks" });
  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate className="space-y-4" data-testid="session-form">
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <Field label="Title" htmlFor="s-title" error={err.title?.message} className="col-span-2">
            <Input id="s-title" {...form.register("title")} aria-invalid={Boolean(err.title)} />
          </Field>
          <Field label="Start" htmlFor="s-start" error={err.startTime?.message}>
            <Input id="s-start" type="time" {...form.register("startTime")} aria-invalid={Boolean(err.startTime)} />
          </Field>
          <Field label="Minutes" htmlFor="s-duration" error={err.durationMin?.message}>
            <Input
              id="s-duration"
              type="number"
              {...form.register("durationMin", { valueAsNumber: true })}
              aria-invalid={Boolean(err.durationMin)}
            />
          </Field>
          <Field label="Planned RPE (CR-10)" htmlFor="s-rpe" error={err.plannedRpe?.message}>
            <Input
              id="s-rpe"
              type="number"
              step={0.5}
              {...form.register("plannedRpe", { valueAsNumber: true })}
              aria-invalid={Boolean(err.plannedRpe)}
            />
          </Field>
        </div>
        <section aria-label="Blocks" className="space-y-2">
          <h3 className="text-sm font-semibold text-ink-900">Blocks</h3>
          {blocks.fields.length === 0 ? <p className="text-xs text-ink-500">No blocks yet.</p> : null}
          {blocks.fields.map((f, i) => {
            const b = watched?.[i];
            return (
              <div key={f.id} data-testid="editor-block" className="rounded-lg ring-1 ring-ink-100">
                <div className="flex items-center gap-2 px-3 py-2">
                  <button
                    type="button"
                    className="min-w-0 flex-1 text-left"
                    aria-expanded={open === i}
                    onClick={() => setOpen(open === i ? null : i)}
                  >
                    <span className="block truncate text-sm font-medium text-ink-900">
                      {b?.title || "Untitled"}{" "}
                      <span className="font-normal text-ink-500">· {b ? BLOCK_KIND_LABEL[b.kind] : ""}</span>
                    </span>
                    <span className="block truncate text-xs text-ink-500">
                      {b ? blockSummary(toBlockInput(b)) : ""}
                    </span>
                  </button>
                  <Button
                    variant="ghost"
                    size="sm"
                    aria-label={`Move block ${i + 1} up`}
                    disabled={i === 0}
                    onClick={() => blocks.move(i, i - 1)}
                  >
                    ↑
                  </Button>
                  <Button
                    variant="ghost"
                    size="sm"
                    aria-label={`Move block ${i + 1} down`}
                    disabled={i === blocks.fields.length - 1}
                    onClick={() => blocks.move(i, i + 1)}
                  >
                    ↓
                  </Button>
                  <Button
                    variant="ghost"
                    size="sm"
                    onClick={() => blocks.remove(i)}
                    aria-label={`Remove block ${i + 1}`}
                  >
                    Remove
                  </Button>
                </div>
                {open === i ? (
                  <div className="border-t border-ink-100 p-3">
                    <BlockFields prefix={`blocks.${i}.`} />
                  </div>
                ) : null}
              </div>
            );
          })}
          <div className="flex gap-2">
            <Select
              aria-label="Add a block from the shelf"
              value={addFrom}
              onChange={(e) => setAddFrom(e.target.value)}
              className="max-w-xs"
            >
              <option value="">Add a block from the shelf…</option>
              {templates.map((t) => (
                <option key={t.id} value={t.id}>
                  {t.title} · {BLOCK_KIND_LABEL[t.kind]}
                </option>
              ))}
            </Select>
            <Button
              variant="secondary"
              disabled={!addFrom}
              onClick={() => {
                const t = templates.find((x) => String(x.id) === addFrom);
                if (!t) return;
                blocks.append({
                  templateId: t.id,
                  kind: t.kind,
                  title: t.title,
                  running: t.running,
                  drills: t.drills,
                  notes: t.notes ?? "",
                });
                setAddFrom("");
              }}
            >
              Add
            </Button>
          </div>
        </section>
        <PlausibilityNote checks={checksOf(session, watched)} />
        <Field label="Notes for the athlete" htmlFor="s-notes" error={err.notes?.message}>
          <Textarea id="s-notes" rows={2} {...form.register("notes")} />
        </Field>
        {notice ? (
          <p
            role="alert"
            data-testid="editor-notice"
            className="rounded-md bg-flag-climb-soft px-3 py-2 text-sm text-ink-900"
          >
            {notice}
          </p>
        ) : null}
        <FormFooter
          onClose={onClose}
          closeLabel="Close"
          submitting={form.formState.isSubmitting}
          saveLabel="Save"
          saveTestId="save-session"
          left={
            <Button
              variant="danger"
              data-testid="delete-session"
              onClick={async () => {
                if (!(await confirm(removeQuestion(session)))) return;
                try {
                  await onDelete(session, version);
                  onClose();
                } catch (e) {
                  handleError(e);
                }
              }}
            >
              {session.status === "published" ? "Cancel session" : "Delete"}
            </Button>
          }
        />
      </form>
    </FormProvider>
  );
}

/** Numbers past a plausibility limit, shown while typing; saving asks "Are you sure?" with them. */
function PlausibilityNote({ checks }: { checks: PlausibilityCheck[] }) {
  if (checks.length === 0) return null;
  return (
    <div
      role="status"
      data-testid="editor-plausibility"
      className="rounded-md border-2 border-dashed border-flag-climb bg-flag-climb-soft px-3 py-2 text-sm text-ink-900"
    >
      <p className="font-semibold">Unusual numbers: saving asks you to confirm them.</p>
      <ul className="mt-1 list-disc pl-5">
        {checks.map((c) => (
          <li key={`${c.field}:${c.limit}`}>{c.block ? `${c.block}: ${c.message}` : c.message}</li>
        ))}
      </ul>
    </div>
  );
}
