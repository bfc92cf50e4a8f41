"use client";

import { clsx } from "clsx";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import useSWR, { useSWRConfig } from "swr";
import { EmptyState } from "@/components/ui/card";
import { noticeApi } from "@/lib/client/api";
import { fetchJson } from "@/lib/client/fetcher";
import { noticeKeys } from "@/lib/client/keys";
import type { AlertRow } from "@/lib/data/alerts";
import type { AlertListQuery } from "@/lib/validations/alerts";
import { AlertCard } from "./alert-card";

type Filter = AlertListQuery["status"];
const FILTERS: Array<{ value: Filter; label: string }> = [
  { value: "unresolved", label: "To handle" },
  { value: "open", label: "Open" },
  { value: "acknowledged", label: "Acknowledged" },
  { value: "resolved", label: "Resolved" },
  { value: "all", label: "All" },
];

const EMPTY: Record<Filter, string> = {
  unresolved: "Nothing to handle. New load flags from the plan or the logs show up here.",
  open: "No open alerts.",
  acknowledged: "No acknowledged alerts.",
  resolved: "No resolved alerts yet.",
  all: "No alerts yet.",
};

/** The alert inbox: filter, read, acknowledge and resolve. Opening it clears the navigation badge. */
export function AlertInbox({ canManage }: { canManage: boolean }) {
  const [filter, setFilter] = useState<Filter>("unresolved");
  const key = noticeKeys.alerts(filter);
  const { data, error, isLoading, mutate } = useSWR<{ alerts: AlertRow[]; unread: number }>(key, fetchJson, {
    refreshInterval: 30_000,
  });
  const { mutate: mutateAll } = useSWRConfig();
  const router = useRouter();
  const marked = useRef(false);

  // Mark as seen after the first answer, so this visit still shows which alerts are new.
  useEffect(() => {
    if (!data || marked.current) return;
    marked.current = true;
    if (data.unread > 0) void noticeApi.markSeen().then(() => router.refresh());
  }, [data, router]);

  const onChange = (updated: AlertRow) => {
    void mutate(
      (prev) => (prev ? { ...prev, alerts: prev.alerts.map((a) => (a.id === updated.id ? updated : a)) } : prev),
      { revalidate: true },
    );
    void mutateAll((k) => noticeKeys.isAlertList(k) && k !== key);
  };

  return (
    <section aria-label="Alerts">
      <div role="tablist" aria-label="Show" className="mb-4 flex gap-1 overflow-x-auto">
        {FILTERS.map((f) => (
          <button
            key={f.value}
            type="button"
            role="tab"
            aria-selected={filter === f.value}
            onClick={() => setFilter(f.value)}
            className={clsx(
              "shrink-0 rounded-full px-3 py-1.5 text-sm font-medium",
              filter === f.value
                ? "bg-ink-900 text-paper"
                : "bg-paper-raised text-ink-600 ring-1 ring-ink-200 ring-inset hover:bg-ink-50",
            )}
          >
            {f.label}
          </button>
        ))}
      </div>
      {error ? (
        <p role="alert" className="text-sm text-form-error">
          {(error as Error).message}
        </p>
      ) : null}
      {isLoading ? <div className="h-40 animate-pulse rounded-card bg-ink-100" aria-busy="true" /> : null}
      {data && data.alerts.length === 0 ? <EmptyState title={EMPTY[filter]} /> : null}
      <div className="space-y-3" data-testid="alert-list">
        {data?.alerts.map((a) => (
          <AlertCard key={a.id} alert={a} canManage={canManage} onChange={onChange} />
        ))}
      </div>
    </section>
  );
}
