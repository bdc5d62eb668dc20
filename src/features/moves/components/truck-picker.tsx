import { Input } from '@/components/ui/input';
import type { Units } from '@shared/schemas/users';
import { formatWeight } from '@/lib/units';
import type { MoveDraft } from '../lib/draft';
import type { PlannerChoices } from './planner-choices';

interface Props {
  draft: MoveDraft;
  trucks: PlannerChoices['trucks'];
  units: Units;
  onChange: (patch: Partial<MoveDraft>) => void;
}

/** Trucks in fill order, each with its driver (or team of two). */
export function TruckPicker({ draft, trucks, units, onChange }: Props) {
  const toggle = (truckId: string, checked: boolean) =>
    onChange({
      loads: checked
        ? [...draft.loads, { truckId, driverNames: [] }]
        : draft.loads.filter((l) => l.truckId !== truckId),
    });
  const setDriver = (truckId: string, index: number, name: string) =>
    onChange({
      loads: draft.loads.map((l) => {
        if (l.truckId !== truckId) return l;
        const driverNames = [...l.driverNames];
        driverNames[index] = name;
        return { ...l, driverNames };
      }),
    });

  return (
    <ul className="flex flex-col gap-2" aria-label="Trucks">
      {trucks.map((truck) => {
        const load = draft.loads.find((l) => l.truckId === truck.id);
        const order = load ? draft.loads.indexOf(load) + 1 : null;
        return (
          <li key={truck.id} className="rounded-md border border-dusk-700 p-3">
            <label className="flex min-h-10 items-center gap-2">
              <input
                type="checkbox"
                className="size-5 accent-ember-400"
                checked={Boolean(load)}
                onChange={(e) => toggle(truck.id, e.target.checked)}
              />
              <span className="font-medium text-dusk-50">{truck.name}</span>
              <span className="text-sm text-dusk-300">
                {truck.palletSpots * truck.tiers} pallets, {formatWeight(truck.payloadKg, units)}{' '}
                payload
              </span>
              {order && <span className="ml-auto text-sm text-ember-300">fills {order}.</span>}
            </label>
            {load && (
              <div className="mt-2 grid gap-2 sm:grid-cols-2">
                {Array.from({ length: draft.drivers }, (_, i) => (
                  <Input
                    key={i}
                    value={load.driverNames[i] ?? ''}
                    maxLength={80}
                    placeholder={i === 0 ? 'Driver' : 'Second driver'}
                    aria-label={`Driver ${i + 1} of ${truck.name}`}
                    onChange={(e) => setDriver(truck.id, i, e.target.value)}
                  />
                ))}
              </div>
            )}
          </li>
        );
      })}
      {trucks.length === 0 && (
        <li className="text-dusk-300">No trucks yet: add them under Settings → Fleet.</li>
      )}
    </ul>
  );
}
