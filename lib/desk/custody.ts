// Who held the trailer between the inspection a finding compares against and the one that found
// the damage, as one timeline, oldest first. Pure: the query passes the rows.

export type CustodyRows = {
  handoffs: {
    id: string;
    kind: 'drop' | 'hook';
    occurredAt: Date;
    driverName: string;
    carrierScac: string;
    carrierName: string;
  }[];
  moves: { id: string; movedAt: Date; toSpot: string }[];
  walks: { id: string; scannedAt: Date }[];
};

/** `values` fill the screen's message for the kind in the reader's language; `text` is the English line. */
export type CustodyEvent = {
  id: string;
  at: Date;
  kind: 'drop' | 'hook' | 'move' | 'walk';
  text: string;
  values: Record<string, string>;
};

export function custodyTimeline(rows: CustodyRows): CustodyEvent[] {
  const events: CustodyEvent[] = [
    ...rows.handoffs.map((h) => ({
      id: h.id,
      at: h.occurredAt,
      kind: h.kind,
      text:
        h.kind === 'drop'
          ? `Dropped by ${h.driverName} (${h.carrierScac}); custody passes to the terminal`
          : `Hooked by ${h.driverName} (${h.carrierScac}); custody passes to ${h.carrierName}`,
      values: { driver: h.driverName, scac: h.carrierScac, carrier: h.carrierName },
    })),
    ...rows.moves.map((m) => ({
      id: m.id,
      at: m.movedAt,
      kind: 'move' as const,
      text: `Yard move to ${m.toSpot}; custody stays with the terminal`,
      values: { spot: m.toSpot },
    })),
    ...rows.walks.map((w) => ({
      id: w.id,
      at: w.scannedAt,
      kind: 'walk' as const,
      text: 'Seen on a yard walk (quick check)',
      values: {},
    })),
  ];
  return events.sort((a, b) => a.at.getTime() - b.at.getTime());
}
