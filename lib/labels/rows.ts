// The row chooser of the label sheet: rows grouped under their terminal, the user's own terminal
// first, so the first row offered is one of the user's own rows and each link names its terminal.

export type LabelRow = {
  id: string;
  name: string;
  terminalId: string;
  terminalName: string;
  trailerCount: number;
};

export type TerminalRows = { terminalId: string; terminalName: string; rows: LabelRow[] };

/** Rows grouped by terminal, keeping the given order inside each; the home terminal's group first. */
export function rowsByTerminal(rows: LabelRow[], homeTerminalId: string | null): TerminalRows[] {
  const groups = new Map<string, TerminalRows>();
  for (const row of rows) {
    const group = groups.get(row.terminalId) ?? {
      terminalId: row.terminalId,
      terminalName: row.terminalName,
      rows: [],
    };
    group.rows.push(row);
    groups.set(row.terminalId, group);
  }
  const all = [...groups.values()];
  return [
    ...all.filter((g) => g.terminalId === homeTerminalId),
    ...all.filter((g) => g.terminalId !== homeTerminalId),
  ];
}
