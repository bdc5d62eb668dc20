import type { PreRollCheck } from '../schemas/moves';

export type PreRollItem = Exclude<keyof PreRollCheck, 'checkedAt'>;

/**
 * What the crew lead checks on each truck before it rolls, in the order walked round the truck.
 * Common practice, no source: nets secured, load strapped, nothing loose, water to cool the load
 * at a stop, and the inspection certificate at hand for the state line.
 */
export const preRollItems: ReadonlyArray<{ item: PreRollItem; label: string }> = [
  { item: 'netsClipped', label: 'Nets on and clipped down' },
  { item: 'strapsTight', label: 'Straps tight on every tier' },
  { item: 'palletsClean', label: 'No loose lids, boxes or bees outside the net' },
  { item: 'waterAboard', label: 'Water aboard to wet the load at a stop' },
  { item: 'certificateInCab', label: 'Inspection certificate in the cab' },
];

/** The items of a recorded check still unticked (all of them when there is no check). */
export function preRollMissing(check: PreRollCheck | null | undefined): PreRollItem[] {
  return preRollItems.filter(({ item }) => check?.[item] !== true).map(({ item }) => item);
}
