import { isSafetyKey } from './safety-keys';
import type {
  Checklist,
  ChecklistItem,
  ChecklistZone,
  ItemKind,
  ReadingField,
  TrailerSpec,
  ZoneKey,
} from './types';

type ItemDef = [key: string, label: string, kind: ItemKind, reading?: ReadingField];

/** Display names of the checklist zones (the gate form, the desk's trailer diagram). */
export const ZONE_LABELS: Record<ZoneKey, string> = {
  nose: 'Nose',
  reefer_unit: 'Refrigeration unit',
  left_side: 'Left side',
  right_side: 'Right side',
  undercarriage: 'Undercarriage',
  tires: 'Tires and wheels',
  rear: 'Rear',
  interior: 'Interior',
  readings: 'Reefer readings',
};

function nose(): ItemDef[] {
  return [
    ['nose.front_wall', 'Front wall', 'condition'],
    ['nose.upper_coupler', 'Upper coupler and king pin', 'condition'],
    ['nose.gladhands', 'Air line gladhands', 'condition'],
    ['nose.electrical_socket', 'Electrical socket', 'condition'],
    ['nose.conspicuity', 'Front conspicuity and lights', 'condition'],
  ];
}

function reeferUnit(): ItemDef[] {
  return [
    ['reefer_unit.housing', 'Unit housing and doors', 'condition'],
    ['reefer_unit.controller', 'Controller and display', 'condition'],
    ['reefer_unit.mounting', 'Unit mounting bolts', 'condition'],
  ];
}

function side(side: 'left' | 'right', spec: TrailerSpec): ItemDef[] {
  const z = `${side}_side`;
  const name = side === 'left' ? 'Left' : 'Right';
  return [
    [`${z}.skin`, `${name} side skin`, spec.kind === 'reefer' ? 'skin' : 'condition'],
    [`${z}.top_rail`, `${name} top rail`, 'condition'],
    [`${z}.bottom_rail`, `${name} bottom rail`, 'condition'],
    [`${z}.rivets`, `${name} side rivets`, 'condition'],
    [`${z}.side_skirt`, `${name} side skirt`, 'condition'],
    [`${z}.conspicuity`, `${name} conspicuity tape and marker lights`, 'condition'],
  ];
}

function undercarriage(spec: TrailerSpec): ItemDef[] {
  const items: ItemDef[] = [
    ['undercarriage.cross_members', 'Cross members', 'condition'],
    ['undercarriage.landing_gear.left_leg', 'Landing gear, left leg', 'condition'],
    ['undercarriage.landing_gear.right_leg', 'Landing gear, right leg', 'condition'],
    ['undercarriage.landing_gear.cross_shaft', 'Landing gear cross shaft', 'condition'],
  ];
  if (spec.kind === 'reefer') {
    items.push(
      ['undercarriage.fuel_tank.body', 'Fuel tank body', 'condition'],
      ['undercarriage.fuel_tank.leaks', 'Fuel tank leaks', 'leak'],
      ['undercarriage.fuel_tank.brackets', 'Fuel tank brackets', 'condition'],
    );
  }
  items.push(
    ['undercarriage.spare_tire', 'Spare tire', 'spare'],
    ['undercarriage.tandem_pin.left_front', 'Tandem locking pin, left front', 'pin'],
    ['undercarriage.tandem_pin.left_rear', 'Tandem locking pin, left rear', 'pin'],
    ['undercarriage.tandem_pin.right_front', 'Tandem locking pin, right front', 'pin'],
    ['undercarriage.tandem_pin.right_rear', 'Tandem locking pin, right rear', 'pin'],
    ['undercarriage.air_lines', 'Air lines', 'condition'],
    ['undercarriage.mud_flap.left', 'Mud flap, left', 'condition'],
    ['undercarriage.mud_flap.right', 'Mud flap, right', 'condition'],
  );
  return items;
}

const DUAL_POSITIONS = [
  ['left_outer', 'left outer'],
  ['left_inner', 'left inner'],
  ['right_inner', 'right inner'],
  ['right_outer', 'right outer'],
] as const;
const SINGLE_POSITIONS = [
  ['left', 'left'],
  ['right', 'right'],
] as const;

function tires(spec: TrailerSpec): ItemDef[] {
  const positions = spec.tireLayout === 'dual' ? DUAL_POSITIONS : SINGLE_POSITIONS;
  const items: ItemDef[] = [];
  for (let axle = 1; axle <= spec.axles; axle++) {
    for (const [pos, words] of positions) {
      items.push([`tires.axle${axle}.${pos}`, `Axle ${axle} ${words} tire and wheel`, 'tire']);
    }
  }
  return items;
}

function rear(spec: TrailerSpec): ItemDef[] {
  const items: ItemDef[] = [];
  for (const [door, name] of [
    ['door_left', 'Left door'],
    ['door_right', 'Right door'],
  ] as const) {
    items.push([`rear.${door}.panel`, `${name} panel`, 'condition']);
    for (let h = 1; h <= spec.hingesPerDoor; h++) {
      items.push([`rear.${door}.hinge_${h}`, `${name} hinge ${h} (from top)`, 'hinge']);
    }
    items.push([`rear.${door}.seal`, `${name} seal`, 'condition']);
    items.push([`rear.${door}.lock_rods`, `${name} lock rods and handles`, 'condition']);
  }
  items.push(
    ['rear.header', 'Door header', 'condition'],
    ['rear.door_frame', 'Door frame', 'condition'],
    ['rear.impact_guard', 'Rear impact guard', 'condition'],
    ['rear.lights', 'Rear lights and conspicuity', 'condition'],
  );
  return items;
}

function interior(spec: TrailerSpec): ItemDef[] {
  const wall: ItemKind = spec.kind === 'reefer' ? 'skin' : 'condition';
  const items: ItemDef[] = [
    ['interior.left_wall', 'Left wall', wall],
    ['interior.right_wall', 'Right wall', wall],
    ['interior.front_wall', 'Front wall (inside)', wall],
    ['interior.scuff_liner', 'Scuff liner', 'condition'],
    ['interior.floor', 'Floor (cracks and gaps)', 'condition'],
    ['interior.cleanliness', 'Cleanliness', 'cleanliness'],
    ['interior.roof', 'Roof (inside)', 'condition'],
  ];
  if (spec.kind === 'reefer') {
    items.push(
      ['interior.bulkhead', 'Bulkhead', 'condition'],
      ['interior.air_chute', 'Air chute', 'condition'],
    );
  }
  return items;
}

function readings(): ItemDef[] {
  return [
    ['readings.fuel', 'Fuel (eighths)', 'reading', 'fuelEighths'],
    ['readings.unit_on', 'Unit running', 'reading', 'isUnitOn'],
    ['readings.setpoint', 'Setpoint (°F)', 'reading', 'setpointF'],
    ['readings.return_air', 'Return air (°F)', 'reading', 'returnAirF'],
    ['readings.engine_hours', 'Engine hours', 'reading', 'engineHours'],
    ['readings.pre_trip', 'Last pre-trip result and time', 'reading', 'preTrip'],
  ];
}

/**
 * Builds the inspection checklist for one trailer: zones in walk-around order, items with
 * stable keys. Reefers add the unit, fuel tank, insulation, bulkhead, air chute and readings;
 * hinge count and tire layout come from the spec.
 */
export function buildChecklist(spec: TrailerSpec): Checklist {
  if (!Number.isInteger(spec.axles) || spec.axles < 1 || spec.axles > 4) {
    throw new RangeError(`axles must be an integer from 1 to 4, got ${spec.axles}`);
  }
  const isReefer = spec.kind === 'reefer';
  const defs: Array<[ZoneKey, ItemDef[]]> = [
    ['nose', nose()],
    ...(isReefer ? [['reefer_unit', reeferUnit()] as [ZoneKey, ItemDef[]]] : []),
    ['left_side', side('left', spec)],
    ['right_side', side('right', spec)],
    ['undercarriage', undercarriage(spec)],
    ['tires', tires(spec)],
    ['rear', rear(spec)],
    ['interior', interior(spec)],
    ...(isReefer ? [['readings', readings()] as [ZoneKey, ItemDef[]]] : []),
  ];
  const zones: ChecklistZone[] = defs.map(([zone, items]) => ({
    key: zone,
    label: ZONE_LABELS[zone],
    items: items.map(([key, label, kind, reading]): ChecklistItem => ({
      key,
      label,
      zone,
      kind,
      ...(reading ? { reading } : {}),
      ...(isSafetyKey(key, kind) ? { isSafety: true as const } : {}),
    })),
  }));
  return { spec, zones, items: zones.flatMap((z) => z.items) };
}
