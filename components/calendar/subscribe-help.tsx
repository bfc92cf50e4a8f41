/** How to subscribe on a phone, in plain steps (menu names as the phone makers use them, common practice). */
export function SubscribeHelp() {
  return (
    <div className="mt-4 space-y-2 text-sm" data-testid="subscribe-help">
      <details className="group rounded-lg bg-paper-sunk px-3 py-2">
        <summary className="cursor-pointer font-medium text-ink-800">On an iPhone or iPad</summary>
        <ol className="mt-2 list-decimal space-y-1 pl-5 text-ink-600">
          <li>
            On the phone, tap <strong>Add to my calendar</strong> above and confirm <strong>Subscribe</strong>.
          </li>
          <li>
            Or copy the link, then open{" "}
            <strong>Settings → Calendar → Accounts → Add Account → Other → Add Subscribed Calendar</strong> and paste
            it.
          </li>
          <li>
            Sessions appear within a few minutes and update by themselves; cancelled ones are marked as cancelled.
          </li>
        </ol>
      </details>
      <details className="group rounded-lg bg-paper-sunk px-3 py-2">
        <summary className="cursor-pointer font-medium text-ink-800">On Android (Google Calendar)</summary>
        <ol className="mt-2 list-decimal space-y-1 pl-5 text-ink-600">
          <li>Copy the link.</li>
          <li>
            In a browser, open <strong>calendar.google.com</strong>, choose{" "}
            <strong>Other calendars → + → From URL</strong>, paste the link and add it.
          </li>
          <li>
            In the Google Calendar app, turn the new calendar on under <strong>Settings</strong> if it is hidden. Google
            refreshes subscribed calendars every few hours.
          </li>
        </ol>
      </details>
      <p className="text-xs text-ink-500">
        The calendar holds your sessions from the last 8 weeks and every session ahead; older ones stay on this page.
      </p>
      <p className="text-xs text-ink-500">
        The link is personal: anyone who has it can see your sessions. If it got out, make a new one; the old link stops
        working at once.
      </p>
    </div>
  );
}
