'use client';

import useSWR from 'swr';
import type { Board } from '@/lib/yard/types';

export const BOARD_KEY = '/api/yard/board';

async function fetchBoard(url: string): Promise<Board> {
  const res = await fetch(url, { cache: 'no-store' });
  if (!res.ok) throw new Error(`The board could not be loaded (${res.status}).`);
  return res.json();
}

/** The live board: refreshed every 5 s and on focus, so two screens agree within seconds. */
export function useBoard(initial?: Board) {
  return useSWR<Board>(BOARD_KEY, fetchBoard, {
    fallbackData: initial,
    refreshInterval: 5000,
    revalidateOnFocus: true,
  });
}
