import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { PasswordResetRequestSchema } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextField } from '../../../components/ui/text-field';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm({ onSent }: { onSent: () => void }) {
  const request = useRequestPasswordReset();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(PasswordResetRequestSchema), defaultValues: { email: '' } });

  const onSubmit = handleSubmit((input) =>
    request.mutate(input, { onSuccess: onSent, onError: (error) => applyApiErrorToForm(error, setError, ['email']) }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        help="The address you sign in with."
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" size="lg" isPending={request.isPending} pendingLabel="Sending…">
        Send a reset link
      </Button>
    </form>
  );
}
