export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      <div className="h-8 w-48 rounded-lg bg-ink-100" />
      <div className="h-4 w-[32rem] max-w-full rounded bg-ink-100" />
      <div className="flex gap-3">
        <div className="h-10 w-64 rounded-lg bg-ink-100" />
        <div className="h-10 w-44 rounded-lg bg-ink-100" />
      </div>
      <div className="space-y-2 rounded-card bg-ink-100/60 p-4">
        {Array.from({ length: 8 }, (_, i) => (
          <div key={i} className="h-8 rounded bg-ink-100" />
        ))}
      </div>
    </div>
  );
}
