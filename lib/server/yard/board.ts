import 'server-only';
import { getBoard } from '@/db/queries/yard-board';
import { done, type Result } from '@/lib/result';
import type { Board } from '@/lib/yard/types';
import { NO_TERMINAL, type YardActor } from './actor';

/** The live board of the actor's home terminal. */
export async function readBoard(actor: YardActor): Promise<Result<Board>> {
  const board = actor.terminalId ? await getBoard(actor.terminalId) : null;
  return board ? done(board) : NO_TERMINAL;
}
