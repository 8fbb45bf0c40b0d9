/** Safety cautions of the trade, shown where someone could get hurt. Wording is Hitchmark's own. */
export const CAUTIONS = {
  underTrailer:
    'Before going under the trailer: chock the wheels and set the brakes. Never crawl under a trailer that is not coupled or standing on its landing gear on firm ground.',
  reefer: 'Keep clear of a running reefer unit: belts and fans can start without warning.',
  outOfService:
    'An out-of-service trailer is not moved on a public road until a qualified technician has repaired it.',
  inspection:
    "Hitchmark's checks support, and do not replace, the driver's own inspection (49 CFR 396.11 and 396.13). Local codes, company policy and licensed mechanics decide.",
} as const;

export function Caution({ children, title = 'Caution' }: { children: React.ReactNode; title?: string }) {
  return (
    <aside
      role="note"
      aria-label={title}
      className="rounded-lg border-l-8 border-warn bg-warn-bg p-3 text-gate text-ink"
    >
      <p className="font-bold">⚠ {title}</p>
      <div className="mt-1">{children}</div>
    </aside>
  );
}
