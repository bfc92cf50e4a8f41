"use client";

import { clsx } from "clsx";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { UnreadBadge } from "@/components/notices/unread-badge";
import type { NavLink } from "@/lib/nav";

export function WorkspaceNav({ links }: { links: NavLink[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="-mx-1 flex gap-1 overflow-x-auto pb-1 md:flex-col md:overflow-visible md:pb-0">
      {links.map((link) => {
        const active = pathname === link.href || pathname.startsWith(`${link.href}/`);
        return (
          <Link
            key={link.href}
            href={link.href}
            aria-current={active ? "page" : undefined}
            className={clsx(
              "flex shrink-0 items-center justify-between gap-2 rounded-lg px-3 py-2 text-sm font-medium transition-colors",
              active ? "bg-ink-900 text-paper" : "text-ink-600 hover:bg-ink-100 hover:text-ink-900",
            )}
          >
            <span>{link.label}</span>
            {link.unread ? <UnreadBadge count={link.unread} /> : null}
          </Link>
        );
      })}
    </nav>
  );
}
