"use client";

import Link from "next/link";
import { useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import type { AlertRow } from "@/lib/data/alerts";
import { formatDayLong, formatInstantShort } from "@/lib/format/dates";
import { figuresHref } from "@/lib/load/figures-link";
import { ALERT_KIND_HINT, ALERT_KIND_LABEL, ALERT_KIND_TOPIC } from "@/lib/notices/alert-display";
import { AlertActionForm } from "./alert-action-form";
import { AlertFacts } from "./alert-facts";

const STATUS_LABEL: Record<AlertRow["status"], string> = {
  open: "Open",
  acknowledged: "Acknowledged",
  resolved: "Resolved",
};
const STATUS_TONE = { open: "spike", acknowledged: "climb", resolved: "steady" } as const;

export function AlertCard({
  alert,
  canManage,
  onChange,
}: {
  alert: AlertRow;
  canManage: boolean;
  onChange: (a: AlertRow) => void;
}) {
  const [action, setAction] = useState<"acknowledge" | "resolve" | "reopen" | null>(null);
  return (
    <Card className="p-4 sm:p-5" data-testid="alert-card" data-alert-id={alert.id} data-status={alert.status}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <div className="flex flex-wrap items-center gap-2">
            {alert.unread ? (
              <span
                className="inline-flex items-center gap-1 text-2xs font-semibold text-flag-spike"
                data-testid="alert-new"
              >
                <span aria-hidden className="h-2 w-2 rounded-full bg-flag-spike" />
                New
              </span>
            ) : null}
            <h3 className="font-semibold text-ink-950">
              <Link href={`/load/${alert.athleteId}`} className="hover:underline" data-testid="alert-athlete">
                {alert.athleteName}
              </Link>
            </h3>
            <Badge tone={alert.kind === "spike" ? "spike" : "climb"} className="tracking-wide uppercase">
              {ALERT_KIND_LABEL[alert.kind]}
            </Badge>
            <Badge tone={STATUS_TONE[alert.status]}>{STATUS_LABEL[alert.status]}</Badge>
          </div>
          <p className="mt-1 text-xs text-ink-500">
            Week of {formatDayLong(alert.weekStart)} · raised {formatInstantShort(alert.createdAt)}
            {alert.provisional ? " · provisional (short history)" : ""}
          </p>
        </div>
        <Link href={`/load/${alert.athleteId}`} className="text-sm font-medium text-lane-700 hover:underline">
          Load page →
        </Link>
      </div>

      <p className="mt-3 text-sm text-ink-700">{alert.reason}</p>
      <p className="mt-1 text-xs text-ink-500">
        {ALERT_KIND_HINT[alert.kind]}{" "}
        {ALERT_KIND_TOPIC[alert.kind] ? (
          <Link
            href={figuresHref(alert.provisional ? "provisional" : ALERT_KIND_TOPIC[alert.kind]!)}
            className="text-lane-700 underline"
            data-testid="alert-explain"
          >
            How this is worked out
          </Link>
        ) : null}
      </p>
      <div className="mt-3">
        <AlertFacts alert={alert} />
      </div>
      {!alert.flagged ? (
        <p
          className="mt-3 rounded-lg bg-flag-steady-soft px-3 py-2 text-xs text-flag-steady"
          data-testid="alert-cleared"
        >
          The current plan no longer raises this flag.
        </p>
      ) : null}

      {alert.note || alert.acknowledgedByName || alert.resolvedByName ? (
        <div className="mt-3 border-t border-ink-100 pt-3 text-sm">
          {alert.note ? (
            <p className="text-ink-800" data-testid="alert-note">
              “{alert.note}”
            </p>
          ) : null}
          <p className="mt-1 text-xs text-ink-500">
            {alert.acknowledgedByName && alert.acknowledgedAt
              ? `Acknowledged by ${alert.acknowledgedByName}, ${formatInstantShort(alert.acknowledgedAt)}. `
              : ""}
            {alert.resolvedByName && alert.resolvedAt
              ? `Resolved by ${alert.resolvedByName}, ${formatInstantShort(alert.resolvedAt)}.`
              : ""}
          </p>
        </div>
      ) : null}

      {canManage && action === null ? (
        <div className="mt-4 flex flex-wrap gap-2">
          {alert.status === "open" ? (
            <Button size="sm" variant="secondary" onClick={() => setAction("acknowledge")}>
              Acknowledge
            </Button>
          ) : null}
          {alert.status !== "resolved" ? (
            <Button size="sm" onClick={() => setAction("resolve")}>
              Resolve…
            </Button>
          ) : (
            <Button size="sm" variant="ghost" onClick={() => setAction("reopen")}>
              Reopen
            </Button>
          )}
        </div>
      ) : null}
      {action ? (
        <AlertActionForm
          alert={alert}
          action={action}
          onCancel={() => setAction(null)}
          onDone={(a) => {
            setAction(null);
            onChange(a);
          }}
        />
      ) : null}
    </Card>
  );
}
