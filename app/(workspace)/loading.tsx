export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      <div className="h-8 w-56 rounded-lg bg-ink-100" />
      <div className="h-4 w-96 max-w-full rounded bg-ink-100" />
      <div className="grid gap-3 sm:grid-cols-3">
        {[0, 1, 2].map((i) => (
          <div key={i} className="h-24 rounded-card bg-ink-100" />
        ))}
      </div>
      <div className="h-64 rounded-card bg-ink-100" />
    </div>
  );
}
