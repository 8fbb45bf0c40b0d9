import 'server-only';
import { signLabelToken } from '@/lib/engine/identity/label-token';
import { appUrl, labelSecret } from '../env';

type LabelRef = { id: string; trailerId: string };

/** The signed token a label carries: the label and its trailer, under LABEL_SECRET. */
export function labelToken(label: LabelRef): string {
  return signLabelToken({ labelId: label.id, trailerId: label.trailerId }, labelSecret());
}

/** The address the label's QR code encodes. */
export function labelLink(label: LabelRef): string {
  return `${appUrl()}/l/${labelToken(label)}`;
}
