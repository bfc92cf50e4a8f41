"use client";

import { clsx } from "clsx";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { useEffect, useId, useRef, type KeyboardEvent, type ReactNode } from "react";
import { UnreadBadge } from "@/components/notices/unread-badge";
import type { NavLink } from "@/lib/nav";

function NavLinks({ links, onFollow, sheet }: { links: NavLink[]; onFollow?: () => void; sheet?: boolean }) {
  const pathname = usePathname();
  return (
    <ul className="flex flex-col gap-1">
      {links.map((link) => {
        const active = pathname === link.href || pathname.startsWith(`${link.href}/`);
        return (
          <li key={link.href}>
            <Link
              href={link.href}
              onClick={onFollow}
              aria-current={active ? "page" : undefined}
              className={clsx(
                "flex items-center justify-between gap-2 rounded-lg px-3 py-2 text-sm font-medium transition-colors",
                active ? "bg-ink-900 text-paper" : "text-ink-600 hover:bg-ink-100 hover:text-ink-900",
              )}
            >
              <span>{link.label}</span>
              {link.unread ? <UnreadBadge count={link.unread} testId={!sheet} /> : null}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}

/** Tab and Shift+Tab go round the sheet's controls instead of leaving for the browser's own bar. */
function keepFocusInside(e: KeyboardEvent<HTMLDialogElement>) {
  if (e.key !== "Tab") return;
  const items = [...e.currentTarget.querySelectorAll<HTMLElement>("a[href], button:not([disabled])")];
  const [first, last] = [items[0], items.at(-1)];
  if (!first || !last) return;
  if (e.shiftKey && document.activeElement === first) {
    e.preventDefault();
    last.focus();
  } else if (!e.shiftKey && document.activeElement === last) {
    e.preventDefault();
    first.focus();
  }
}

/**
 * The signed-in navigation: a sidebar list from md up; below it a "Menu" button that opens every item in a sheet.
 * The sheet is a modal <dialog>: the platform makes the page behind inert and closes it on Escape; focus goes
 * round inside it (keepFocusInside) and back to the button when it closes. `footer` (who is signed in, sign out)
 * shows at the foot of the sheet.
 */
export function WorkspaceNav({ links, footer }: { links: NavLink[]; footer?: ReactNode }) {
  const sheet = useRef<HTMLDialogElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const pathname = usePathname();
  const id = useId();
  const close = () => sheet.current?.close();
  // A page change (a link followed, back/forward) closes the sheet.
  useEffect(() => {
    sheet.current?.close();
  }, [pathname]);
  const current = links.find((l) => pathname === l.href || pathname.startsWith(`${l.href}/`));
  const unread = links.reduce((n, l) => n + (l.unread ?? 0), 0);
  return (
    <nav aria-label="Main" className="print:hidden">
      <div className="hidden md:block">
        <NavLinks links={links} />
      </div>
      <button
        ref={button}
        type="button"
        aria-haspopup="dialog"
        aria-controls={id}
        onClick={() => sheet.current?.showModal()}
        data-testid="nav-menu-button"
        className={clsx(
          "flex items-center gap-2 rounded-lg px-3 py-2 text-sm font-medium text-ink-800 ring-1 ring-ink-200",
          "ring-inset hover:bg-ink-50 md:hidden",
        )}
      >
        <svg aria-hidden viewBox="0 0 16 16" className="h-4 w-4">
          <path d="M2 4h12M2 8h12M2 12h12" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
        </svg>
        Menu
        {current ? <span className="sr-only">, on {current.label}</span> : null}
        {unread > 0 ? <UnreadBadge count={unread} testId={false} /> : null}
      </button>
      <dialog
        ref={sheet}
        id={id}
        aria-labelledby={`${id}-title`}
        data-testid="nav-sheet"
        // A click on the backdrop (outside the sheet's box) closes it.
        onClick={(e) => e.target === e.currentTarget && close()}
        onKeyDown={keepFocusInside}
        onClose={() => button.current?.focus()}
        className={clsx(
          "m-0 ml-auto h-dvh max-h-none w-72 max-w-[85vw] bg-paper-raised p-0 shadow-lift backdrop:bg-ink-950/40",
          "md:hidden",
        )}
      >
        <div className="flex h-full flex-col gap-4 px-4 py-4">
          <div className="flex items-center justify-between">
            <h2 id={`${id}-title`} className="text-sm font-semibold text-ink-900">
              Menu
            </h2>
            <button
              type="button"
              onClick={close}
              className="rounded-md px-2 py-1 text-sm text-ink-600 hover:bg-ink-100 hover:text-ink-900"
              data-testid="nav-sheet-close"
            >
              Close
            </button>
          </div>
          <NavLinks links={links} onFollow={close} sheet />
          {footer ? <div className="mt-auto border-t border-ink-100 pt-4">{footer}</div> : null}
        </div>
      </dialog>
    </nav>
  );
}
