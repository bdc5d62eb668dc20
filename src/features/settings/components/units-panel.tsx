import type { Units } from '@shared/schemas/users';
import { Section } from '@/components/ui/page-header';
import { FormAlert } from '@/components/ui/form-alert';
import { useToast } from '@/components/ui/toast';
import { useUnits } from '@/lib/auth';
import { useUpdatePreferences } from '../api/update-preferences';

const choices: Array<{ value: Units; label: string; example: string }> = [
  { value: 'imperial', label: 'Imperial', example: 'pounds, acres, miles' },
  { value: 'metric', label: 'Metric', example: 'kilograms, hectares, kilometres' },
];

/** Imperial or metric for this user; every screen switches at once. */
export function UnitsPanel() {
  const units = useUnits();
  const update = useUpdatePreferences();
  const toast = useToast();
  return (
    <Section title="Units">
      <fieldset>
        <legend className="mb-3 text-dusk-200">Weights, areas and distances are shown in:</legend>
        <div className="flex flex-col gap-2 sm:flex-row">
          {choices.map((choice) => (
            <label
              key={choice.value}
              className="flex min-h-11 flex-1 cursor-pointer items-center gap-3 rounded-md bg-dusk-950 px-4 py-3 ring-1 ring-dusk-600 has-[:checked]:ring-2 has-[:checked]:ring-ember-400"
            >
              <input
                type="radio"
                name="units"
                value={choice.value}
                className="size-5 accent-ember-400"
                checked={units === choice.value}
                onChange={() =>
                  update.mutate(
                    { units: choice.value },
                    { onSuccess: () => toast.show(`Units set to ${choice.label.toLowerCase()}.`) },
                  )
                }
              />
              <span>
                <span className="block font-medium">{choice.label}</span>
                <span className="block text-sm text-dusk-300">{choice.example}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <div className="mt-3">
        <FormAlert error={update.error} />
      </div>
    </Section>
  );
}
