import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { ButtonLink } from '@/app/_components/button';
import { NOT_OUR_LABEL, replacedMessage } from '@/lib/labels/wording';
import { canOpen } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { resolveLabelToken } from '@/lib/server/labels';
import { labelTokenSchema } from '@/lib/validation/labels';

export const metadata: Metadata = { title: 'Trailer label' };

// Where a label's QR code points. A good label opens the handoff start page (jockeys, who do not
// use the gate, get the trailer file); a forged, damaged or replaced one is refused in words.
export default async function ScanLinkPage({ params }: PageProps<'/l/[token]'>) {
  const user = await requireUser();
  const parsed = labelTokenSchema.safeParse((await params).token);
  const label = parsed.success
    ? await resolveLabelToken(parsed.data)
    : ({ ok: false, error: 'not_ours' } as const);
  if (label.ok)
    redirect(
      canOpen(user.role, 'gate') ? `/gate/trailers/${label.trailerId}` : `/trailers/${label.trailerId}`,
    );

  const isReplaced = label.error === 'revoked';
  const next = canOpen(user.role, 'gate') ? '/gate' : '/yard';
  return (
    <section
      className="mx-auto max-w-lg space-y-4 rounded-xl border-l-8 border-danger bg-paper p-5"
      aria-labelledby="label-refused"
    >
      <h1 id="label-refused" className="text-gate-xl font-bold">
        {isReplaced ? 'Old label' : 'Label not accepted'}
      </h1>
      <p className="text-gate-lg">
        {isReplaced ? replacedMessage(label.replacedAt, user.terminalTimeZone ?? 'UTC') : NOT_OUR_LABEL}
      </p>
      <p className="text-gate text-ink-soft">
        {isReplaced
          ? 'Look for the newer label on the trailer, or type the unit number. Tell the terminal clerk so the old label comes off.'
          : 'Type the unit number or the VIN instead, and tell the terminal clerk so the trailer gets a new label.'}
      </p>
      <ButtonLink href={next}>Type the unit number</ButtonLink>
    </section>
  );
}
