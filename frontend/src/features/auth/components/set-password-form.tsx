import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextField } from '../../../components/ui/text-field';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useCompleteToken } from '../api/complete-token';
import { SetPasswordFormSchema } from './set-password-schema';

type SetPasswordFormProps = { token: string; email: string; onDone: () => void };

export function SetPasswordForm({ token, email, onDone }: SetPasswordFormProps) {
  const complete = useCompleteToken();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(SetPasswordFormSchema), defaultValues: { password: '', confirmPassword: '' } });

  const onSubmit = handleSubmit(({ password }) =>
    complete.mutate(
      { token, password },
      { onSuccess: onDone, onError: (error) => applyApiErrorToForm(error, setError, ['password']) },
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {/* Lets password managers file the new password under the right account. */}
      <input type="text" name="username" autoComplete="username" value={email} readOnly hidden />
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        help="At least 10 characters. A few unrelated words make a strong one."
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.confirmPassword?.message}
        {...register('confirmPassword')}
      />
      <Button type="submit" size="lg" isPending={complete.isPending} pendingLabel="Saving…">
        Set password and sign in
      </Button>
    </form>
  );
}
