/** The yard board as the API sends it (times as ISO strings) and the screens read it. */
export interface BoardHold {
  severity: 'out_of_service' | 'restricted';
  reason: string;
}

export interface BoardTrailer {
  id: string;
  unitNumber: string;
  kind: 'reefer' | 'dry_van';
  isLoaded: boolean;
  isReeferOn: boolean | null;
  setpointTenthsF: number | null;
  fuelEighths: number | null;
  gateInAt: string | null;
  lastSeenAt: string | null;
  holds: BoardHold[];
}

export interface BoardSpot {
  id: string;
  label: string;
  kind: 'slot' | 'door';
  rowId: string | null;
  /** Position on the map: row order then slot order (doors after every row). */
  order: number;
  trailer: BoardTrailer | null;
}

export interface BoardRowInfo {
  id: string;
  name: string;
}

export interface YardPolicy {
  freeTimeHours: number;
  lowFuelEighths: number;
}

export interface Board {
  terminal: { name: string; timeZone: string };
  policy: YardPolicy;
  rows: BoardRowInfo[];
  spots: BoardSpot[];
  generatedAt: string;
}

/** One trailer line of the board table (and of the CSV export). */
export interface TableRow {
  trailer: BoardTrailer;
  spotLabel: string;
  spotOrder: number;
}
