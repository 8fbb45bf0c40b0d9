import type { Role } from '@/lib/auth/roles';

export type HandoffActor = { id: string; role: Role; carrierId: string | null; terminalId: string | null };
export type SubmitResult = { handoffId: string; verificationCode: string; isReplay: boolean };
export type SubmitOptions = {
  /** The handoff time; the demo seed records the past. */
  now?: Date;
  sendReceipt?: boolean;
  /** Many submits in a row (the demo seed): commits do not wait for the disk. */
  isBulk?: boolean;
};
