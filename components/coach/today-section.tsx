import Link from "next/link";
import type { ReactNode } from "react";
import { Card } from "@/components/ui/card";

/** One block of the coach's day: a heading with its count, the items, and where the whole list is handled. */
export function TodaySection({
  id,
  title,
  count,
  summary,
  more,
  empty,
  children,
}: {
  id: string;
  title: string;
  count?: number;
  /** Said in place of the bare count, e.g. "3 of 5 logged". */
  summary?: string;
  /** The screen that handles the whole list. */
  more?: { href: string; label: string };
  empty: string;
  children?: ReactNode;
}) {
  const hasItems = count === undefined ? Boolean(children) : count > 0;
  return (
    <Card className="p-4" data-testid={`today-${id}`}>
      <section aria-labelledby={`today-${id}-title`}>
        <div className="flex items-baseline justify-between gap-2">
          <h2 id={`today-${id}-title`} className="font-semibold text-ink-950">
            {title}
            {count !== undefined ? (
              <span className="ml-1.5 text-sm font-normal text-ink-500">({summary ?? count})</span>
            ) : null}
          </h2>
          {more ? (
            <Link href={more.href} className="shrink-0 text-sm font-medium text-lane-700 underline">
              {more.label}
            </Link>
          ) : null}
        </div>
        {hasItems ? (
          <ul className="mt-2 divide-y divide-ink-50">{children}</ul>
        ) : (
          <p className="mt-2 text-sm text-ink-500">{empty}</p>
        )}
      </section>
    </Card>
  );
}

/** One line of a section: the whole line is the link to where the item is handled (a thumb-sized target). */
export function TodayItem({ href, children, testId }: { href: string; children: ReactNode; testId?: string }) {
  return (
    <li>
      <Link
        href={href}
        data-testid={testId}
        className={
          "flex min-h-11 flex-wrap items-center gap-x-2 gap-y-0.5 py-2 text-sm text-ink-800 hover:bg-paper-sunk/60"
        }
      >
        {children}
      </Link>
    </li>
  );
}
