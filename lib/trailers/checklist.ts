// The checklist of one trailer, from its stored shape. Every caller (gate form, submit, uploads,
// seed) goes through here, so they all agree on which items a trailer has.
import { buildChecklist, type Checklist, type TireLayout, type TrailerKind } from '@/lib/engine';

export type TrailerShape = {
  kind: TrailerKind;
  hingesPerDoor: number;
  axleCount: number;
  tireLayout: TireLayout;
  /** US gallons; 0 or null when unknown (the policy's default tank size applies). */
  fuelTankGallons: number | null;
};

export function checklistOf(trailer: TrailerShape): Checklist {
  return buildChecklist({
    kind: trailer.kind,
    hingesPerDoor: trailer.hingesPerDoor === 5 ? 5 : 4,
    axles: trailer.axleCount,
    tireLayout: trailer.tireLayout,
    fuelTankGallons: trailer.fuelTankGallons || undefined,
  });
}
