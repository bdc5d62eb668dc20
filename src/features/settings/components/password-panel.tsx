import { useForm } from 'react-hook-form';
import { passwordChangeRequest } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input } from '@/components/ui/input';
import { Section } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { applyServerErrors, schemaResolver } from '@/lib/forms';
import { useChangePassword } from '../api/change-password';
import { useFormFailure } from '@/hooks/use-form-failure';

interface PasswordValues {
  currentPassword: string;
  newPassword: string;
}

/** Changes the user's own password; other sessions of theirs end. */
export function PasswordPanel() {
  const change = useChangePassword();
  const toast = useToast();
  const saveFailure = useFormFailure();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<PasswordValues>({
    resolver: schemaResolver(passwordChangeRequest),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      await change.mutateAsync(values);
      reset();
      toast.show('Password changed. Other devices are signed out.');
    } catch (error) {
      saveFailure.fail(
        error,
        applyServerErrors(error, setError, ['currentPassword', 'newPassword']),
      );
    }
  });
  return (
    <Section title="Your password">
      <form
        onSubmit={submit}
        noValidate
        aria-label="Change password"
        className="flex max-w-md flex-col gap-4"
      >
        <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
        <Field label="Current password" error={errors.currentPassword?.message}>
          <Input type="password" autoComplete="current-password" {...register('currentPassword')} />
        </Field>
        <Field
          label="New password"
          hint="At least 8 characters"
          error={errors.newPassword?.message}
        >
          <Input type="password" autoComplete="new-password" {...register('newPassword')} />
        </Field>
        <div>
          <Button type="submit" variant="secondary" busy={isSubmitting}>
            Change password
          </Button>
        </div>
      </form>
    </Section>
  );
}
