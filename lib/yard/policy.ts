import type { YardPolicy } from './types';

// The terminal's yard rules live in policies.data next to the engine's and are read by
// lib/terminal/policy.ts. When a terminal has no figure yet, these are Hitchmark's starting
// values (common practice, not a regulation).
export const DEFAULT_YARD_POLICY: YardPolicy = { freeTimeHours: 48, lowFuelEighths: 4 };
