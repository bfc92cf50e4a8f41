/** The small count next to "Alerts" in the navigation. */
export function UnreadBadge({ count }: { count: number }) {
  if (count <= 0) return null;
  return (
    <span
      data-testid="alerts-unread"
      aria-label={`${count} unread`}
      className="min-w-5 rounded-full bg-flag-spike px-1.5 text-center text-xs leading-5 font-semibold text-white"
    >
      {count > 99 ? "99+" : count}
    </span>
  );
}
