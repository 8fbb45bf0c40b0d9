/**
 * Public data types of the Hitchmark condition engine.
 * Everything here is plain, serialisable data. Times are `Date` objects (UTC instants);
 * callers convert ISO strings at the edge. Display time zones are passed in explicitly.
 */

export type * from './types/checklist';
export type * from './types/timeline';
export type * from './types/results';
export type * from './types/policy-yard';
export type * from './types/codes';
