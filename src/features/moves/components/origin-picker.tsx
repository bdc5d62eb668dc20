import { Input } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { TableSkeleton } from '@/components/ui/skeleton';
import { FormAlert } from '@/components/ui/form-alert';
import { formatCount } from '@/lib/units';
import { useAvailability } from '../api/get-availability';
import type { MoveDraft } from '../lib/draft';

interface Props {
  draft: MoveDraft;
  moveId?: string;
  onChange: (patch: Partial<MoveDraft>) => void;
}

/** Colonies per yard and lot that night; the planner takes up to what is free. */
export function OriginPicker({ draft, moveId, onChange }: Props) {
  const availability = useAvailability(draft.nightOf, moveId);
  const taken = (yardId: string, lotId: string) =>
    draft.origins.find((o) => o.yardId === yardId && o.lotId === lotId)?.colonies ?? 0;

  const setTaken = (yardId: string, lotId: string, colonies: number) => {
    const exists = draft.origins.some((o) => o.yardId === yardId && o.lotId === lotId);
    const origins =
      colonies <= 0
        ? draft.origins.filter((o) => !(o.yardId === yardId && o.lotId === lotId))
        : exists
          ? draft.origins.map((o) =>
              o.yardId === yardId && o.lotId === lotId ? { ...o, colonies } : o,
            )
          : [...draft.origins, { yardId, lotId, colonies }];
    onChange({ origins });
  };

  const moveUp = (index: number) => {
    if (index === 0) return;
    const origins = [...draft.origins];
    [origins[index - 1], origins[index]] = [origins[index], origins[index - 1]];
    onChange({ origins });
  };

  if (availability.isPending) return <TableSkeleton rows={4} label="Loading colonies by yard" />;
  if (availability.isError) return <FormAlert error={availability.error} />;
  const items = availability.data.items;
  const nameOf = (yardId: string, lotId: string) => {
    const item = items.find((i) => i.yardId === yardId && i.lotId === lotId);
    return item ? `${item.yardName} (${item.lotName})` : 'A yard no longer listed';
  };

  return (
    <div className="flex flex-col gap-4">
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm" aria-label="Colonies by yard">
          <thead className="text-dusk-300">
            <tr>
              <th className="py-2 pr-3 font-medium">Yard and lot</th>
              <th className="py-2 pr-2 text-right font-medium" title="In the ledger that night">
                Ledger
              </th>
              <th className="py-2 pr-2 text-right font-medium" title="Promised to other open moves">
                Promised
              </th>
              <th className="py-2 pr-2 text-right font-medium">Free</th>
              <th className="py-2 font-medium">Take</th>
            </tr>
          </thead>
          <tbody>
            {items.map((item) => {
              const value = taken(item.yardId, item.lotId);
              return (
                <tr key={`${item.yardId}-${item.lotId}`} className="border-t border-dusk-700">
                  <td className="py-2 pr-3">
                    <span className="text-dusk-50">{item.yardName}</span>
                    <span className="block text-dusk-300">{item.lotName}</span>
                  </td>
                  <td className="py-2 pr-2 text-right tabular-nums">
                    {formatCount(item.inLedger)}
                  </td>
                  <td
                    className="py-2 pr-2 text-right tabular-nums"
                    title={item.promisedTo.map((p) => `${p.moveName}: ${p.colonies}`).join('\n')}
                  >
                    {formatCount(item.promised)}
                  </td>
                  <td className="py-2 pr-2 text-right font-medium tabular-nums">
                    {formatCount(item.free)}
                  </td>
                  <td className="w-24 py-2">
                    <Input
                      type="number"
                      inputMode="numeric"
                      min={0}
                      max={item.free}
                      value={value || ''}
                      placeholder="0"
                      disabled={item.free === 0 && value === 0}
                      aria-label={`Colonies from ${item.yardName}, ${item.lotName}`}
                      onChange={(e) => {
                        const wanted = Math.floor(Number(e.target.value) || 0);
                        // Never more than free; the server has the final word when saving.
                        setTaken(item.yardId, item.lotId, Math.max(0, Math.min(wanted, item.free)));
                      }}
                    />
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {items.length === 0 && <p className="text-dusk-300">No colonies in any yard that night.</p>}
      {draft.origins.length > 0 && (
        <div>
          <p className="mb-1 text-sm font-medium text-dusk-100">Pick-up order</p>
          <ol className="flex flex-col gap-1" aria-label="Pick-up order">
            {draft.origins.map((o, i) => (
              <li key={`${o.yardId}-${o.lotId}`} className="flex items-center gap-2 text-sm">
                <span className="w-6 text-right tabular-nums text-dusk-300">{i + 1}.</span>
                <span className="flex-1">
                  {nameOf(o.yardId, o.lotId)}: {formatCount(o.colonies)} colonies
                </span>
                {i > 0 && (
                  <Button size="sm" variant="ghost" onClick={() => moveUp(i)}>
                    Earlier
                  </Button>
                )}
              </li>
            ))}
          </ol>
        </div>
      )}
    </div>
  );
}
