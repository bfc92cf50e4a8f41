export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      <div className="h-8 w-56 rounded-lg bg-ink-100" />
      <div className="h-10 w-96 max-w-full rounded-lg bg-ink-100" />
      <div className="h-72 rounded-card bg-ink-100" />
      <div className="h-52 rounded-card bg-ink-100" />
    </div>
  );
}
