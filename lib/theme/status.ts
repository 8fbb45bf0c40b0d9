/**
 * What each trailer status looks like, in both themes: the token family (text colour, its pale
 * background in light / deep background at night, and the border). Words always go beside the
 * colour (WCAG 1.4.1: colour is never the only sign).
 */
export const STATUS_TONES = {
  outOfService: 'danger',
  restricted: 'hold',
  lowFuel: 'warn',
  // a loaded reefer whose unit is not running: the load warms; its own violet, apart from the holds
  reeferOff: 'off',
} as const;

export type TrailerStatus = keyof typeof STATUS_TONES;
