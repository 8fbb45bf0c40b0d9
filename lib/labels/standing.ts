// Whether a scanned label still speaks for its trailer. Pure: the caller loads the label and the
// trailer's current label (its newest unrevoked one).

export type LabelStanding = { isCurrent: true } | { isCurrent: false; replacedAt: Date | null };

/**
 * A label is current while it is unrevoked and is its trailer's newest unrevoked label. Otherwise
 * it was replaced: at its revocation, or, never revoked but superseded, when the newer label was
 * issued (null when the trailer has no current label at all).
 */
export function labelStanding(
  label: { id: string; revokedAt: Date | null },
  current: { id: string; issuedAt: Date } | null,
): LabelStanding {
  if (label.revokedAt === null && current?.id === label.id) return { isCurrent: true };
  return { isCurrent: false, replacedAt: label.revokedAt ?? current?.issuedAt ?? null };
}
