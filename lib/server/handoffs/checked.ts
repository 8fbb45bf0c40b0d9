// A handoff that passed every check of the submit, with what the engine made of it: what
// store.ts writes.
import type { OpenHoldRow } from '@/db/queries/handoff-submit';
import type { HandoffEvent, TimelineEvent } from '@/lib/engine';
import type { Evaluation } from '@/lib/handoffs/evaluation';
import type { normalizeItems } from '@/lib/handoffs/items';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import type { HandoffActor } from './types';

export type CheckedHandoff = {
  input: HandoffSubmitInput;
  actor: HandoffActor;
  trailer: { id: string; unitNumber: string };
  terminal: { id: string; name: string; timeZone: string };
  carrier: { id: string; name: string; contactEmail: string; locale: string };
  event: HandoffEvent;
  evaluation: Evaluation;
  items: ReturnType<typeof normalizeItems>;
  photos: { id: string; sha256: string }[];
  openHolds: OpenHoldRow[];
  history: TimelineEvent[];
  sendReceipt: boolean;
  /** SHA-256 of the submitted body, kept with the draft key (replay.ts compares it). */
  requestHash: string;
  /** When the record is stored; the event's time differs only for a correction (the corrected record's time). */
  recordedAt: Date;
  /** Set for a correction: whether the record it corrects is the trailer's latest. */
  correction: { isOfLatest: boolean } | null;
  /** The driver's answer at a hook of a "no perishable loads" trailer; null when not asked. */
  isLoadPerishable: boolean | null;
};
