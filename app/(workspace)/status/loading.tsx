export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      <div className="h-8 w-48 rounded-lg bg-ink-100" />
      <div className="h-10 w-full max-w-2xl rounded-lg bg-ink-100" />
      <div className="h-96 rounded-card bg-ink-100" />
    </div>
  );
}
