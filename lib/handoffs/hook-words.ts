// Kept apart from holds.ts so the gate form reads these words without loading the reasons'
// catalogues (and zod) with its first page.
/** Words of the gate's hook refusals and the perishable question (one place, for translation). */
export const HOOK_WORDS = {
  perishableQuestion: 'Is the load perishable?',
  perishableAsk: (unit: string) =>
    `Trailer ${unit} is restricted: no perishable loads. Say whether this load is perishable.`,
  perishableField: 'This trailer may not carry a perishable load: say whether this load is perishable.',
  refused: (unit: string, because: 'out_of_service' | 'yard_only' | 'perishable_load', foundNow: boolean) => {
    const tail = foundNow ? ' The trailer is now on hold; tell the terminal clerk.' : '';
    if (because === 'out_of_service')
      return foundNow
        ? `What you recorded puts trailer ${unit} out of service: it may not leave the gate.${tail}`
        : `Trailer ${unit} is out of service and may not leave the gate.`;
    if (because === 'yard_only')
      return foundNow
        ? `What you recorded restricts trailer ${unit} to yard moves only: it may not leave the gate.${tail}`
        : `Trailer ${unit} is restricted to yard moves only and may not leave the gate.`;
    return `Trailer ${unit} may not carry a perishable load (restricted: no perishable loads). Take another trailer for this load.${tail}`;
  },
} as const;
