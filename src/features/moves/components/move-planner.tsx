import { useState } from 'react';
import type { Units } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input, Select, Textarea } from '@/components/ui/input';
import { Section } from '@/components/ui/page-header';
import { ApiError } from '@/lib/api-client';
import { useCreateMove } from '../api/create-move';
import { usePreviewMove } from '../api/preview-move';
import { useUpdateMove } from '../api/update-move';
import {
  emptyDraft,
  draftFromMove,
  toMoveRequest,
  toPreviewRequest,
  type MoveDraft,
} from '../lib/draft';
import { useDebouncedValue } from '../lib/use-debounced-value';
import type { Move } from '../types';
import { DestinationPicker } from './destination-picker';
import { OriginPicker } from './origin-picker';
import { PlanPreview } from './plan-preview';
import type { PlannerChoices } from './planner-choices';
import { TruckPicker } from './truck-picker';

interface Props {
  choices: PlannerChoices;
  units: Units;
  /** The saved move when editing. */
  move?: Move;
  defaultNight: string;
  /** A site to start with as the destination (from the Atlas's "plan a move to this block"). */
  defaultDestinationSiteId?: string | null;
  onSaved: (move: Move) => void;
  /** Fetches the move as it is now (after a 409); returns its version. */
  onReload?: () => Promise<number | undefined>;
  onCancel?: () => void;
}

/** The move planner: inputs on the left, the live plan (debounced ~300 ms) beside them. */
export function MovePlanner({
  choices,
  units,
  move,
  defaultNight,
  defaultDestinationSiteId,
  onSaved,
  onReload,
  onCancel,
}: Props) {
  const [draft, setDraft] = useState<MoveDraft>(() =>
    move ? draftFromMove(move) : emptyDraft(defaultNight, defaultDestinationSiteId),
  );
  const [baseVersion, setBaseVersion] = useState(move?.version ?? 0);
  const [reloading, setReloading] = useState(false);
  const [nameMissing, setNameMissing] = useState(false);
  const change = (patch: Partial<MoveDraft>) => setDraft((d) => ({ ...d, ...patch }));

  const settled = useDebouncedValue(toPreviewRequest(draft, move?.id), 300);
  const preview = usePreviewMove(settled);
  const create = useCreateMove();
  const update = useUpdateMove();
  const saving = create.isPending || update.isPending;
  const saveError = create.error ?? update.error;
  const canSave = toPreviewRequest(draft) !== null;

  const save = () => {
    if (!draft.name.trim()) {
      setNameMissing(true);
      return;
    }
    setNameMissing(false);
    const body = toMoveRequest(draft);
    if (move) {
      update.mutate({ id: move.id, version: baseVersion, changes: body }, { onSuccess: onSaved });
    } else {
      create.mutate(body, { onSuccess: onSaved });
    }
  };

  const reload = async () => {
    if (!onReload) return;
    setReloading(true);
    try {
      const version = await onReload();
      if (version !== undefined) setBaseVersion(version);
      update.reset();
    } finally {
      setReloading(false);
    }
  };

  const issues = saveError instanceof ApiError ? saveError.fieldIssues : [];

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,30rem)_minmax(0,1fr)] xl:items-start">
      <form
        aria-label={move ? 'Edit the move' : 'Plan a move'}
        className="flex flex-col gap-5"
        onSubmit={(e) => {
          e.preventDefault();
          save();
        }}
      >
        <Section title="The night">
          <div className="grid gap-3 sm:grid-cols-2">
            <Field
              label="Move name"
              error={nameMissing ? 'Required.' : undefined}
              className="sm:col-span-2"
            >
              <Input
                value={draft.name}
                maxLength={120}
                placeholder="Almond run 4: Larkspur Hollow"
                onChange={(e) => change({ name: e.target.value })}
              />
            </Field>
            <Field label="Night of" hint="The evening loading starts.">
              <Input
                type="date"
                value={draft.nightOf}
                onChange={(e) => change({ nightOf: e.target.value, origins: [] })}
              />
            </Field>
            <Field label="Drivers per truck">
              <Select
                value={String(draft.drivers)}
                onChange={(e) => change({ drivers: Number(e.target.value) === 2 ? 2 : 1 })}
              >
                <option value="1">One driver</option>
                <option value="2">A team of two</option>
              </Select>
            </Field>
            <Field
              label="Loading (minutes)"
              hint="All yards of the night, driving between them too."
            >
              <Input
                type="number"
                min={0}
                max={1440}
                value={draft.loadingMinutes}
                onChange={(e) => change({ loadingMinutes: Number(e.target.value) })}
              />
            </Field>
            <Field label="Average speed (km/h)" hint="Including short stops.">
              <Input
                type="number"
                min={1}
                max={130}
                value={draft.averageSpeedKmh}
                onChange={(e) => change({ averageSpeedKmh: Number(e.target.value) })}
              />
            </Field>
          </div>
        </Section>
        <Section title="Where to">
          <DestinationPicker draft={draft} choices={choices} onChange={change} />
        </Section>
        <Section title="Colonies from the yards">
          {draft.nightOf ? (
            <OriginPicker draft={draft} moveId={move?.id} onChange={change} />
          ) : (
            <p className="text-dusk-300">Choose the night first.</p>
          )}
        </Section>
        <Section title="Trucks and drivers">
          <TruckPicker draft={draft} trucks={choices.trucks} units={units} onChange={change} />
        </Section>
        <Section title="Notes for the crew">
          <Field label="Notes">
            <Textarea
              value={draft.notes}
              maxLength={4000}
              onChange={(e) => change({ notes: e.target.value })}
            />
          </Field>
        </Section>
        <FormAlert
          error={saveError}
          unplaced={issues}
          onReload={onReload ? reload : undefined}
          reloading={reloading}
        />
        <div className="flex flex-wrap gap-2">
          <Button type="submit" busy={saving} disabled={!canSave}>
            {move ? 'Save changes' : 'Save as draft'}
          </Button>
          {onCancel && (
            <Button variant="ghost" onClick={onCancel}>
              Cancel
            </Button>
          )}
        </div>
        {!canSave && (
          <p className="text-sm text-dusk-300">
            To save: a night, a destination and colonies from at least one yard.
          </p>
        )}
      </form>
      <div className="xl:sticky xl:top-4">
        <PlanPreview
          plan={settled ? preview.data : undefined}
          units={units}
          updating={preview.isFetching}
          error={settled ? preview.error : null}
        />
      </div>
    </div>
  );
}
