import "server-only";
import { isJoinedMember } from "@/lib/data/notification-settings";
import {
  claimDueMessages,
  markMessageAttemptFailed,
  markMessageSent,
  nextOutboxDueAt,
  type ClaimedMessage,
} from "@/lib/data/outbox";
import type { OutboxKind } from "@/lib/domain/outbox";
import { readMailConfig, type MailConfig } from "@/lib/mail/mail-config";
import { sendMail } from "@/lib/mail/transport";
import { backoffDelayMs, DEFAULT_BACKOFF, type BackoffPolicy } from "./backoff";
import { queueDueDigests } from "./digests";

export interface OutboxWorkerOptions {
  /** Longest sleep between two looks at the queue. */
  pollMs?: number;
  /** How long a claimed row stays ours; longer than the SMTP timeouts (10 s connect + 30 s socket). */
  leaseMs?: number;
  batchSize?: number;
  backoff?: BackoffPolicy;
  now?: () => Date;
  mailConfig?: () => MailConfig;
  /** Queue the daily alert digests on each round (off in tests that count mails precisely). */
  digests?: boolean;
  log?: (message: string) => void;
}

type RoundResult = { sent: number; retrying: number; failed: number };

export interface OutboxWorker {
  /** One delivery round over every due message; concurrent calls share the round in flight. */
  runOnce(): Promise<RoundResult>;
  start(): void;
  /** Deliver soon (after a commit queued new mail) instead of waiting for the next poll. */
  kick(): void;
  stop(): Promise<void>;
  readonly running: boolean;
}

function describeError(err: unknown): string {
  if (!(err instanceof Error)) return String(err);
  const e = err as Error & { code?: string; responseCode?: number; response?: string };
  const parts = [e.code, e.responseCode ? String(e.responseCode) : undefined, e.response ?? e.message].filter(Boolean);
  return parts.join(" · ");
}

/** Team mail that only members may read; invitations and reset links go to people who are not (yet) members. */
const MEMBERS_ONLY: ReadonlySet<OutboxKind> = new Set([
  "alert",
  "digest",
  "calendar_request",
  "calendar_cancel",
  "session_message",
]);

function domainOf(from: string): string {
  return /@([^>\s]+)>?\s*$/.exec(from)?.[1] ?? "sprintwright.local";
}

export function createOutboxWorker(options: OutboxWorkerOptions = {}): OutboxWorker {
  const pollMs = options.pollMs ?? 5_000;
  const leaseMs = options.leaseMs ?? 120_000;
  const batchSize = options.batchSize ?? 20;
  const policy = options.backoff ?? DEFAULT_BACKOFF;
  const now = options.now ?? (() => new Date());
  const mailConfig = options.mailConfig ?? (() => readMailConfig());
  const log = options.log ?? ((m: string) => console.warn(`[outbox] ${m}`));

  let inFlight: Promise<RoundResult> | null = null;
  let timer: NodeJS.Timeout | null = null;
  let started = false;

  /** Someone removed between queueing and sending gets nothing of the team's: the row fails for good instead. */
  async function stillMember(message: ClaimedMessage): Promise<boolean> {
    if (!MEMBERS_ONLY.has(message.kind) || message.teamId === null) return true;
    if (await isJoinedMember({ teamId: message.teamId, email: message.toEmail })) return true;
    await markMessageAttemptFailed({
      id: message.id,
      leaseToken: message.leaseToken,
      error: "Not sent: the recipient is not a member of the team",
      retryAt: null,
    });
    log(`message ${message.id} to ${message.toEmail}: not sent, no longer a member of team ${message.teamId}`);
    return false;
  }

  async function deliver(message: ClaimedMessage, config: MailConfig | Error): Promise<keyof RoundResult> {
    try {
      if (!(await stillMember(message))) return "failed";
      if (config instanceof Error) throw config;
      const messageId = await sendMail(
        {
          to: message.toEmail,
          subject: message.subject,
          html: message.html,
          text: message.text,
          icalEvent:
            message.icalMethod && message.icalContent
              ? { method: message.icalMethod, content: message.icalContent }
              : undefined,
          // Stable per row: if a lease ever runs out mid-send and the row is sent again, clients can drop the copy.
          headers: { "Message-ID": `<outbox-${message.id}-${message.createdAt.getTime()}@${domainOf(config.from)}>` },
        },
        config,
      );
      await markMessageSent({ id: message.id, leaseToken: message.leaseToken, messageId, now: now() });
      return "sent";
    } catch (err) {
      const error = describeError(err);
      const giveUp = message.attempts >= Math.min(message.maxAttempts, policy.maxAttempts);
      const retryAt = giveUp ? null : new Date(now().getTime() + backoffDelayMs(message.attempts, policy));
      await markMessageAttemptFailed({ id: message.id, leaseToken: message.leaseToken, error, retryAt });
      log(
        `message ${message.id} to ${message.toEmail}: attempt ${message.attempts} failed (${error})${giveUp ? ", giving up" : ""}`,
      );
      return giveUp ? "failed" : "retrying";
    }
  }

  async function round(): Promise<RoundResult> {
    const result: RoundResult = { sent: 0, retrying: 0, failed: 0 };
    if (options.digests !== false) await queueDueDigests({ now: now() });
    let config: MailConfig | Error;
    try {
      config = mailConfig();
    } catch (err) {
      config = err instanceof Error ? err : new Error(String(err));
    }
    // Rows that fail are rescheduled into the future, so this loop ends once the due ones are done.
    for (;;) {
      const batch = await claimDueMessages({ now: now(), limit: batchSize, leaseMs });
      if (batch.length === 0) break;
      for (const message of batch) result[await deliver(message, config)] += 1;
    }
    return result;
  }

  function runOnce(): Promise<RoundResult> {
    inFlight ??= round().finally(() => {
      inFlight = null;
    });
    return inFlight;
  }

  function schedule(delayMs: number) {
    if (!started) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(tick, Math.max(0, delayMs));
    timer.unref();
  }

  async function tick() {
    timer = null;
    try {
      await runOnce();
    } catch (err) {
      log(`round failed: ${describeError(err)}`);
    }
    let delay = pollMs;
    try {
      const due = await nextOutboxDueAt();
      if (due) delay = Math.min(pollMs, due.getTime() - now().getTime());
    } catch {
      /* the next poll will look again */
    }
    schedule(Math.max(50, delay));
  }

  return {
    runOnce,
    start() {
      if (started) return;
      started = true;
      schedule(0);
    },
    kick() {
      schedule(25);
    },
    async stop() {
      started = false;
      if (timer) clearTimeout(timer);
      timer = null;
      await inFlight?.catch(() => undefined);
    },
    get running() {
      return started;
    },
  };
}

type WorkerCache = { worker?: OutboxWorker };
const cache = globalThis as typeof globalThis & { __sprintwrightOutbox?: WorkerCache };

/** Starts the app's one outbox worker for this Node process (idempotent; instrumentation.ts calls it). */
export function startOutboxWorker(options: OutboxWorkerOptions = {}): OutboxWorker {
  cache.__sprintwrightOutbox ??= {};
  const c = cache.__sprintwrightOutbox;
  if (!c.worker) {
    c.worker = createOutboxWorker(options);
    c.worker.start();
  }
  return c.worker;
}

/** Wakes the running worker, if this process has one (writers call it after their transaction commits). */
export function kickOutbox(): void {
  cache.__sprintwrightOutbox?.worker?.kick();
}
