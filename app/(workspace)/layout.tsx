import { clsx } from "clsx";
import type { ReactNode } from "react";
import { Logo } from "@/components/shell/logo";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { WorkspaceNav } from "@/components/shell/workspace-nav";
import { pageViewer } from "@/lib/auth/page-access";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { navFor } from "@/lib/nav";
import { extraNavLinks } from "@/lib/nav-extras";

export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer();
  const extras = await extraNavLinks(viewer);
  const base = navFor(viewer.role).map(({ href, label }) => extras.find((e) => e.href === href) ?? { href, label });
  const links = [...base, ...extras.filter((e) => !base.some((b) => b.href === e.href))];
  // Shown twice (the sidebar, the phone's menu sheet); only the sidebar's carries the test ids.
  const who = (ids: boolean) => (
    <>
      <p className="text-sm font-medium text-ink-900" data-testid={ids ? "viewer-name" : undefined}>
        {viewer.name}
      </p>
      <p className="text-xs text-ink-500" data-testid={ids ? "viewer-role" : undefined}>
        {ROLE_LABEL[viewer.role]}
      </p>
      <div className="mt-2 -ml-2">
        <SignOutButton />
      </div>
    </>
  );
  return (
    <div className="min-h-dvh md:grid md:grid-cols-[15rem_1fr] print:block">
      <aside
        className={clsx(
          "flex items-center justify-between gap-3 border-b border-ink-100 bg-paper-raised px-4 py-3 md:sticky md:block",
          "md:top-0 md:h-dvh md:border-r md:border-b-0 md:px-4 md:py-6 print:hidden",
        )}
      >
        <Logo href="/home" />
        <p className="mt-1 hidden text-xs text-ink-500 md:mt-6 md:block" data-testid="team-name">
          {viewer.teamName}
        </p>
        <div className="md:mt-4">
          <WorkspaceNav links={links} footer={who(false)} />
        </div>
        <div className="mt-8 hidden border-t border-ink-100 pt-4 md:block">{who(true)}</div>
      </aside>
      <main className="mx-auto w-full max-w-7xl min-w-0 px-4 py-6 md:px-8 md:py-8 print:max-w-none print:p-0">
        {children}
      </main>
    </div>
  );
}
