export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      <div className="h-8 w-40 rounded-lg bg-ink-100" />
      <div className="h-10 w-full max-w-2xl rounded-lg bg-ink-100" />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="space-y-3">
          {[0, 1, 2].map((i) => (
            <div key={i} className="h-44 rounded-card bg-ink-100" />
          ))}
        </div>
        <div className="h-56 rounded-card bg-ink-100" />
      </div>
    </div>
  );
}
