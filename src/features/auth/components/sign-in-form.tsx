import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { signInRequest } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input } from '@/components/ui/input';
import { Alert } from '@/components/ui/alert';
import { ApiError } from '@/lib/api-client';
import { useSignIn, type SignInInput } from '@/lib/auth';
import { applyServerErrors, schemaResolver } from '@/lib/forms';

/** E-mail and password; on success the caller decides where to go. */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [failure, setFailure] = useState<unknown>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SignInInput>({
    resolver: schemaResolver(signInRequest),
    defaultValues: { email: '', password: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await signIn.mutateAsync(values);
      onSignedIn();
    } catch (error) {
      applyServerErrors(error, setError, ['email', 'password']);
      setFailure(error);
    }
  });

  const wrongPassword = failure instanceof ApiError && failure.status === 401;
  return (
    <form onSubmit={submit} noValidate aria-label="Sign in" className="flex flex-col gap-4">
      {wrongPassword ? (
        <Alert title={failure.message}>
          Check the e-mail and password, or ask the owner of your operation to reset your access.
        </Alert>
      ) : (
        <FormAlert error={failure} />
      )}
      <Field label="E-mail" error={errors.email?.message}>
        <Input type="email" autoComplete="username" {...register('email')} />
      </Field>
      <Field label="Password" error={errors.password?.message}>
        <Input type="password" autoComplete="current-password" {...register('password')} />
      </Field>
      <Button type="submit" busy={isSubmitting}>
        Sign in
      </Button>
    </form>
  );
}
