/**
 * The small count next to "Alerts" in the navigation: the number is drawn, screen readers hear "N unread".
 * The navigation shows it in more than one place (sidebar, phone menu); only the sidebar's carries the test id.
 */
export function UnreadBadge({ count, testId = true }: { count: number; testId?: boolean }) {
  if (count <= 0) return null;
  return (
    <>
      <span
        aria-hidden
        data-testid={testId ? "alerts-unread" : undefined}
        className="min-w-5 rounded-full bg-flag-spike px-1.5 text-center text-xs leading-5 font-semibold text-white"
      >
        {count > 99 ? "99+" : count}
      </span>
      <span className="sr-only">, {count} unread</span>
    </>
  );
}
