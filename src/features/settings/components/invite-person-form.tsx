import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { roles, userCreateRequest, type UserCreateRequest } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input, Select } from '@/components/ui/input';
import { applyServerErrors, schemaResolver } from '@/lib/forms';
import { useCreatePerson } from '../api/create-person';
import type { Person } from '../types';
import { useFormFailure } from '@/hooks/use-form-failure';

export const roleLabels = {
  owner: 'Owner',
  planner: 'Planner',
  crew: 'Crew',
  grower: 'Grower',
} as const;
export const roleHints = {
  owner: 'Everything, including people, fleet and prices',
  planner: 'Yards, sites, contracts and moves; not people or prices',
  crew: 'Yards and moves; sees no prices',
  grower: 'Only their own orchards and contracts',
} as const;

type InviteValues = z.input<typeof userCreateRequest>;

/** Creates an account for a new person with a first password to pass on to them. */
export function InvitePersonForm({
  growers,
  onSaved,
  onCancel,
}: {
  growers: Array<{ id: string; name: string }>;
  onSaved: (person: Person) => void;
  onCancel: () => void;
}) {
  const create = useCreatePerson();
  const saveFailure = useFormFailure();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<InviteValues, unknown, UserCreateRequest>({
    resolver: schemaResolver(userCreateRequest),
    defaultValues: { name: '', email: '', role: 'crew', growerId: null, password: '' },
  });
  const role = useWatch({ control, name: 'role' });
  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      onSaved(
        await create.mutateAsync({
          ...values,
          growerId: values.role === 'grower' ? values.growerId : null,
        }),
      );
    } catch (error) {
      saveFailure.fail(
        error,
        applyServerErrors(error, setError, ['name', 'email', 'role', 'growerId', 'password']),
      );
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Invite a person" className="flex flex-col gap-4">
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <Field label="Name" error={errors.name?.message}>
        <Input autoComplete="off" {...register('name')} />
      </Field>
      <Field label="E-mail" error={errors.email?.message}>
        <Input type="email" autoComplete="off" {...register('email')} />
      </Field>
      <Field label="Role" hint={roleHints[role ?? 'crew']} error={errors.role?.message}>
        <Select {...register('role')}>
          {roles.map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </Select>
      </Field>
      {role === 'grower' && (
        <Field
          label="Grower"
          hint="The grower this person signs in for"
          error={errors.growerId?.message}
        >
          <Select {...register('growerId', { setValueAs: (v) => v || null })}>
            <option value="">Choose a grower</option>
            {growers.map((g) => (
              <option key={g.id} value={g.id}>
                {g.name}
              </option>
            ))}
          </Select>
        </Field>
      )}
      <Field
        label="First password"
        hint="Give it to them in person or by phone; they can change it in Settings"
        error={errors.password?.message}
      >
        <Input type="text" autoComplete="new-password" {...register('password')} />
      </Field>
      <div className="flex gap-2">
        <Button type="submit" busy={isSubmitting}>
          Invite
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
