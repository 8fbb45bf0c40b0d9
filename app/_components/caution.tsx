/**
 * Safety cautions of the trade (common practice), shown where someone could get hurt. Wording is
 * Hitchmark's own; local codes, company policy and licensed mechanics decide.
 */
export const CAUTIONS = {
  underTrailer:
    'Before going under the trailer: chock the wheels and set the brakes. Never crawl under a trailer that is not coupled or standing on its landing gear on firm ground.',
  reefer: 'Keep clear of a running reefer unit: belts and fans can start without warning.',
  outOfService:
    'An out-of-service trailer is not moved on a public road until a qualified technician has repaired it.',
  yardOnly:
    'A trailer restricted to yard moves only does not leave the gate until the fault is fixed; a licensed mechanic decides when it is.',
  noPerishable:
    'A trailer restricted from perishable loads may not hold its temperature: load it only with goods that can take that.',
  coupling:
    'Before you pull away: do a tug test against the trailer brakes, check the kingpin is locked in the fifth-wheel jaws (look, do not only listen), crank the landing gear fully up, and connect the air and electrical lines without kinks or chafing.',
  fuelling:
    'Fuelling: engine and reefer unit off, no smoking or open flame, stay with the nozzle, and clean up any spill at once. Follow the posted fuelling rules of the site.',
  yardWalk:
    'Walking the yard: wear high-visibility clothing, walk where tractors can see you, never between a tractor and a trailer being coupled, and keep clear of running reefer units.',
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
