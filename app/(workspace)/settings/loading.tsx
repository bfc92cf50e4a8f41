export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      <div className="h-8 w-40 rounded-lg bg-ink-100" />
      <div className="grid gap-4 rounded-card bg-ink-100/60 p-5 sm:grid-cols-2">
        {Array.from({ length: 9 }, (_, i) => (
          <div key={i} className="h-16 rounded bg-ink-100" />
        ))}
      </div>
    </div>
  );
}
