import Link from 'next/link';

type Props = {
  trailer: {
    id: string;
    unitNumber: string;
    kind: string;
    status: string;
    ownerName: string;
    ownerScac: string;
    terminalName: string | null;
    spotLabel: string | null;
    isLoaded: boolean;
    fuelEighths: number | null;
  };
  kind: 'drop' | 'hook';
  suggested: 'drop' | 'hook';
};

const STATUS_WORDS: Record<string, string> = {
  in_yard: 'in the yard',
  on_road: 'on the road',
  gone: 'gone from the fleet',
};

export function TrailerSummary({ trailer, kind, suggested }: Props) {
  const other = kind === 'drop' ? 'hook' : 'drop';
  return (
    <section aria-labelledby="trailer-title" className="space-y-2">
      <h1 id="trailer-title" className="text-gate-xl font-bold">
        {kind === 'drop' ? 'Drop (gate in)' : 'Hook (gate out)'}: {trailer.unitNumber}
      </h1>
      <p className="text-gate">
        {trailer.kind === 'reefer' ? 'Reefer' : 'Dry van'} of {trailer.ownerName} ({trailer.ownerScac}),{' '}
        {STATUS_WORDS[trailer.status] ?? trailer.status}
        {trailer.terminalName ? ` at ${trailer.terminalName}` : ''}
        {trailer.spotLabel ? `, slot ${trailer.spotLabel}` : ''}.
      </p>
      {kind !== suggested ? (
        <p className="rounded-lg bg-warn-bg p-2 text-gate-sm text-warn">
          Hitchmark suggests a {suggested} for a trailer {STATUS_WORDS[trailer.status]}.
        </p>
      ) : null}
      <Link
        href={`/gate/trailers/${trailer.id}?kind=${other}`}
        className="inline-flex min-h-tap items-center text-gate-sm font-bold text-brand underline"
      >
        Record a {other} instead
      </Link>
    </section>
  );
}
