"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { clsx } from "clsx";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Textarea } from "@/components/ui/field";
import { medicalApi } from "@/lib/client/api";
import { fetchJson } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { medicalKeys } from "@/lib/client/keys";
import type { SessionLogDto } from "@/lib/data/logs";
import { formatInstantShort } from "@/lib/format/dates";
import type { SessionMessageDto } from "@/lib/data/session-messages";
import { sessionMessageSchema, type SessionMessageInput } from "@/lib/validations/session-messages";
import { LogLockLine } from "./log-lock-line";

type Thread = {
  session: { title: string; status: string };
  log: SessionLogDto | null;
  messages: SessionMessageDto[];
};

const COMPLETION: Record<SessionLogDto["completion"], string> = { yes: "Done", partly: "Partly done", no: "Not done" };

/**
 * The athlete's log note on a session and the short thread under it, where the athlete, the coaches and the
 * physio answer each other; every message is e-mailed to the others in the thread. With `canReopen` (a coach) a
 * published session's log that closed to the athlete can be reopened here too.
 */
export function SessionThread({
  sessionId,
  className,
  canReopen = false,
}: {
  sessionId: number;
  className?: string;
  canReopen?: boolean;
}) {
  const key = medicalKeys.thread(sessionId);
  const { data, error, mutate } = useSWR<Thread>(key, fetchJson);
  const [failure, setFailure] = useState<string | null>(null);
  const inputId = useId();
  const form = useForm<SessionMessageInput>({
    resolver: zodResolver(sessionMessageSchema),
    defaultValues: { body: "" },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    try {
      const { messages } = await medicalApi.postMessage(sessionId, values);
      await mutate((prev) => (prev ? { ...prev, messages } : prev), { revalidate: false });
      form.reset({ body: "" });
    } catch (e) {
      if (!applyServerErrors(form, e)) setFailure((e as Error).message);
    }
  });
  const bodyError = form.formState.errors.body?.message;
  return (
    <section
      aria-labelledby={`${inputId}-title`}
      className={clsx("space-y-3 text-sm", className)}
      data-testid="session-thread"
    >
      <h3 id={`${inputId}-title`} className="font-semibold text-ink-950">
        Log note and messages
      </h3>
      {error ? <p className="text-form-error">Could not load the messages: {(error as Error).message}</p> : null}
      {data?.log ? (
        <div className="rounded-lg bg-paper-sunk/60 p-3" data-testid="log-note">
          <p className="text-xs text-ink-500">
            Logged {formatInstantShort(data.log.updatedAt)} · {COMPLETION[data.log.completion]}
            {data.log.rpe !== null ? ` · RPE ${data.log.rpe}` : ""}
            {data.log.minutes !== null ? ` · ${data.log.minutes} min` : ""}
          </p>
          {data.log.notes ? (
            <p className="mt-1 font-medium whitespace-pre-line text-ink-900">&ldquo;{data.log.notes}&rdquo;</p>
          ) : (
            <p className="mt-1 text-ink-500">No note with the log.</p>
          )}
        </div>
      ) : data ? (
        <p className="text-ink-500">Not logged yet.</p>
      ) : null}
      {canReopen && data?.session.status === "published" ? (
        <LogLockLine sessionId={sessionId} title={data.session.title} />
      ) : null}
      {data && data.messages.length > 0 ? (
        <ol className="space-y-2" data-testid="thread-messages">
          {data.messages.map((m) => (
            <li key={m.id} className="rounded-lg bg-paper-raised p-3 ring-1 ring-ink-100 ring-inset">
              <p className="text-xs text-ink-500">
                <span className="font-medium text-ink-800">{m.authorName}</span> · {formatInstantShort(m.createdAt)}
              </p>
              <p className="mt-1 whitespace-pre-line text-ink-900">{m.body}</p>
            </li>
          ))}
        </ol>
      ) : null}
      <form onSubmit={onSubmit} className="space-y-2" noValidate>
        <label htmlFor={inputId} className="block text-sm font-medium text-ink-800">
          Answer on this session
        </label>
        <Textarea
          id={inputId}
          rows={2}
          aria-invalid={bodyError ? true : undefined}
          aria-describedby={bodyError ? `${inputId}-error` : undefined}
          data-testid="thread-input"
          {...form.register("body")}
        />
        {bodyError ? (
          <p id={`${inputId}-error`} role="alert" className="text-xs font-medium text-form-error">
            {bodyError}
          </p>
        ) : null}
        {failure ? (
          <p role="alert" className="text-xs font-medium text-form-error">
            {failure}
          </p>
        ) : null}
        <div className="flex items-center justify-between gap-2">
          <p className="text-xs text-ink-500">The athlete and everyone who wrote here get it by e-mail.</p>
          <Button type="submit" size="sm" disabled={form.formState.isSubmitting} data-testid="thread-send">
            Send
          </Button>
        </div>
      </form>
    </section>
  );
}
