import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import type { MoveDraft } from '../lib/draft';
import type { PlannerChoices } from './planner-choices';

interface Props {
  draft: MoveDraft;
  choices: PlannerChoices;
  onChange: (patch: Partial<MoveDraft>) => void;
}

/** Destination kind, the site(s) of one grower or a yard, and the contract of that grower. */
export function DestinationPicker({ draft, choices, onChange }: Props) {
  const growerName = new Map(choices.growers.map((g) => [g.id, g.name]));
  const selectedGrower =
    draft.destinationKind === 'site'
      ? (choices.sites.find((s) => s.id === draft.destinationIds[0])?.growerId ?? null)
      : null;
  const groups = new Map<string, PlannerChoices['sites']>();
  for (const site of choices.sites) {
    const key = site.growerId ?? '';
    groups.set(key, [...(groups.get(key) ?? []), site]);
  }
  const contracts = selectedGrower
    ? choices.contracts.filter((c) => c.growerId === selectedGrower)
    : [];

  const toggleSite = (siteId: string, checked: boolean) => {
    const site = choices.sites.find((s) => s.id === siteId);
    if (!checked) {
      onChange({ destinationIds: draft.destinationIds.filter((id) => id !== siteId) });
      return;
    }
    // Several sites of one grower: a site of another grower starts a new selection.
    const sameGrower = site && site.growerId === selectedGrower;
    const destinationIds = sameGrower ? [...draft.destinationIds, siteId] : [siteId];
    const contract = choices.contracts.find(
      (c) => c.growerId === site?.growerId && c.siteIds.includes(siteId),
    );
    onChange({
      destinationIds,
      contractId: sameGrower ? draft.contractId : (contract?.id ?? null),
    });
  };

  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 font-semibold text-dusk-50">Destination</legend>
      <div className="flex gap-4" role="radiogroup" aria-label="Destination kind">
        {(['site', 'yard'] as const).map((kind) => (
          <label key={kind} className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name="destinationKind"
              className="size-5 accent-ember-400"
              checked={draft.destinationKind === kind}
              onChange={() =>
                onChange({ destinationKind: kind, destinationIds: [], contractId: null })
              }
            />
            {kind === 'site' ? "A grower's site" : 'One of our yards'}
          </label>
        ))}
      </div>
      {draft.destinationKind === 'yard' ? (
        <Field label="Destination yard">
          <Select
            value={draft.destinationIds[0] ?? ''}
            onChange={(e) => onChange({ destinationIds: e.target.value ? [e.target.value] : [] })}
          >
            <option value="">Choose a yard…</option>
            {choices.yards.map((y) => (
              <option key={y.id} value={y.id}>
                {y.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : (
        <div className="flex max-h-72 flex-col gap-3 overflow-y-auto rounded-md border border-dusk-700 p-3">
          {[...groups.entries()].map(([growerId, sites]) => (
            <div key={growerId || 'none'}>
              <p className="text-sm text-dusk-300">
                {growerId ? (growerName.get(growerId) ?? 'Grower') : 'No grower'}
              </p>
              {sites.map((site) => (
                <label key={site.id} className="flex min-h-10 items-center gap-2">
                  <input
                    type="checkbox"
                    className="size-5 accent-ember-400"
                    checked={draft.destinationIds.includes(site.id)}
                    onChange={(e) => toggleSite(site.id, e.target.checked)}
                  />
                  {site.name} <span className="text-sm text-dusk-300">({site.crop})</span>
                </label>
              ))}
            </div>
          ))}
          <p className="text-sm text-dusk-300">
            Several sites are allowed when they share a grower.
          </p>
        </div>
      )}
      <Field
        label="Contract"
        hint={
          draft.destinationKind === 'yard'
            ? 'Moves between our own yards carry no contract.'
            : selectedGrower
              ? `Contracts of ${growerName.get(selectedGrower) ?? 'this grower'}.`
              : 'Choose a site first.'
        }
      >
        <Select
          value={draft.contractId ?? ''}
          disabled={contracts.length === 0}
          onChange={(e) => onChange({ contractId: e.target.value || null })}
        >
          <option value="">No contract</option>
          {contracts.map((c) => (
            <option key={c.id} value={c.id}>
              {c.season} {c.crop}: {c.coloniesOrdered} colonies ({c.status})
            </option>
          ))}
        </Select>
      </Field>
    </fieldset>
  );
}
