"use client";

import { useState } from "react";
import useSWR from "swr";
import { Card } from "@/components/ui/card";
import { noticeApi } from "@/lib/client/api";
import { fetchJson } from "@/lib/client/fetcher";
import { noticeKeys } from "@/lib/client/keys";
import type { NotificationSettingsView } from "@/lib/data/notification-settings";
import { ALERT_EMAIL_CHOICES, notificationSettingsSchema } from "@/lib/validations/notifications";

const CHOICE_TEXT: Record<(typeof ALERT_EMAIL_CHOICES)[number], { label: string; hint: string }> = {
  each: { label: "Each alert", hint: "An e-mail as soon as a plan change or a log raises a new flag." },
  digest: { label: "Daily digest", hint: "One e-mail at 07:00 with the day's new flags (none when there are none)." },
  off: { label: "No e-mail", hint: "Alerts only appear here, in the inbox." },
};

/** The member's own choice of alert e-mail. */
export function NotificationSettingsForm() {
  const { data, mutate, error } = useSWR<NotificationSettingsView>(noticeKeys.notificationSettings, fetchJson);
  const [status, setStatus] = useState<string | null>(null);

  async function choose(value: string) {
    const parsed = notificationSettingsSchema.safeParse({ alertEmail: value });
    if (!parsed.success) return setStatus(parsed.error.issues[0]?.message ?? "Invalid choice");
    setStatus("Saving…");
    try {
      await mutate(noticeApi.saveSettings(parsed.data), {
        optimisticData: { alertEmail: parsed.data.alertEmail, isDefault: false },
        rollbackOnError: true,
      });
      setStatus("Saved");
    } catch (err) {
      setStatus((err as Error).message);
    }
  }

  return (
    <Card className="p-4 sm:p-5">
      <fieldset>
        <legend className="font-semibold text-ink-950">Alert e-mails</legend>
        <p className="mt-1 text-sm text-ink-500">How you hear about new load flags for this team.</p>
        {error ? (
          <p role="alert" className="mt-2 text-sm text-form-error">
            {(error as Error).message}
          </p>
        ) : null}
        <div className="mt-3 space-y-2" data-testid="notification-settings">
          {ALERT_EMAIL_CHOICES.map((c) => (
            <label key={c} className="flex cursor-pointer items-start gap-3 rounded-lg p-2 hover:bg-ink-50">
              <input
                type="radio"
                name="alertEmail"
                value={c}
                checked={data?.alertEmail === c}
                disabled={!data}
                onChange={() => void choose(c)}
                className="mt-1 accent-lane-600"
              />
              <span>
                <span className="block text-sm font-medium text-ink-900">{CHOICE_TEXT[c].label}</span>
                <span className="block text-xs text-ink-500">{CHOICE_TEXT[c].hint}</span>
              </span>
            </label>
          ))}
        </div>
        <p aria-live="polite" className="mt-2 h-4 text-xs text-ink-500">
          {status}
        </p>
      </fieldset>
    </Card>
  );
}
