// Words of the gate form's safety checks (one place, for translation).
export const SAFETY_WORDS = {
  heading: 'Safety checks: look at each one',
  explain:
    'Pins, spare, tires, fuel leaks, door hinges and locks, and landing gear are never copied from the last record. Answer them from what you see now.',
  sameAsLastAll: 'Same as last for every zone (safety items excluded)',
  notCopied: 'Safety item: answer from what you see now.',
  treadLabel: 'Shallowest tread you measured (32nds of an inch)',
  treadNeeded: 'Give the shallowest tread you measured first.',
  showItems: (group: string) => `Change one item: ${group}`,
  hideItems: (group: string) => `Hide the items: ${group}`,
  stated: (n: number) => `Answered: ${n} ${n === 1 ? 'item' : 'items'}. Change any one below if it differs.`,
} as const;
