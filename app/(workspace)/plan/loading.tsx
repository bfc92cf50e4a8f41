/** Shaped like the planner: header, then the grid beside the shelf. */
export default function PlanLoading() {
  return (
    <div aria-busy="true" aria-label="Loading the week plan" className="animate-pulse">
      <div className="mb-2 h-3 w-24 rounded bg-ink-100" />
      <div className="mb-6 h-8 w-64 rounded-lg bg-ink-100" />
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_15rem]">
        <div className="space-y-px overflow-hidden rounded-card">
          <div className="h-12 bg-ink-100" />
          {Array.from({ length: 8 }, (_, i) => (
            <div key={i} className="h-20 bg-ink-50" />
          ))}
        </div>
        <div className="h-96 rounded-card bg-ink-50" />
      </div>
    </div>
  );
}
