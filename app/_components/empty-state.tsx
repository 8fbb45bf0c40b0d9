export function EmptyState({ title, children }: { title: string; children?: React.ReactNode }) {
  return (
    <div className="rounded-xl border-2 border-dashed border-paper-line bg-paper p-6 text-center">
      <p className="text-gate-lg font-bold">{title}</p>
      {children ? <div className="mt-2 text-gate text-ink-soft">{children}</div> : null}
    </div>
  );
}
