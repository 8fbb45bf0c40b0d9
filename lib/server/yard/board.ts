import 'server-only';
import { getBoard } from '@/db/queries/yard-board';
import { done, type Result } from '@/lib/result';
import { requestLocale } from '@/lib/server/i18n/request';
import type { Board } from '@/lib/yard/types';
import { NO_TERMINAL, type YardActor } from './actor';

/** The live board of the actor's home terminal. */
export async function readBoard(actor: YardActor): Promise<Result<Board>> {
  const board = actor.terminalId ? await getBoard(actor.terminalId, new Date(), await requestLocale()) : null;
  return board ? done(board) : NO_TERMINAL;
}
