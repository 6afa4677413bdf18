import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { SignInInputSchema } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextField } from '../../../components/ui/text-field';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(SignInInputSchema), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit((input) =>
    signIn.mutate(input, {
      onSuccess: onSignedIn,
      onError: (error) => applyApiErrorToForm(error, setError, ['email', 'password']),
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={errors.root?.server?.message} />
      <TextField label="E-mail" type="email" autoComplete="username" error={errors.email?.message} {...register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" size="lg" isPending={signIn.isPending} pendingLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
