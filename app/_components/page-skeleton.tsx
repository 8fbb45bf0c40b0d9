export function PageSkeleton() {
  return (
    <div aria-busy="true" aria-label="Loading" className="space-y-3">
      <div className="h-8 w-1/3 animate-pulse rounded bg-paper-line" />
      <div className="h-24 animate-pulse rounded-xl bg-paper-line" />
      <div className="h-24 animate-pulse rounded-xl bg-paper-line" />
    </div>
  );
}
