import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextField } from '../../../components/ui/text-field';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useSetPin } from '../api/set-pin';
import { SetPinFormSchema } from './set-pin-schema';

type SetPinFormProps = { email: string; onSaved: () => void };

export function SetPinForm({ email, onSaved }: SetPinFormProps) {
  const setPin = useSetPin();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(SetPinFormSchema), defaultValues: { pin: '', pinAgain: '', password: '' } });

  const onSubmit = handleSubmit(({ pin, password }) =>
    setPin.mutate(
      { pin, password },
      {
        onSuccess: () => {
          reset();
          onSaved();
        },
        onError: (error) => applyApiErrorToForm(error, setError, ['pin', 'password']),
      },
    ),
  );

  const pinProps = { type: 'password', inputMode: 'numeric', autoComplete: 'off', maxLength: 8 } as const;
  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-md flex-col gap-5">
      {/* Tells password managers whose password is asked for, so they do not offer to save the PIN. */}
      <input type="text" name="username" autoComplete="username" value={email} readOnly hidden />
      <FormError message={errors.root?.server?.message} />
      <TextField label="New PIN" help="4 to 8 digits. Avoid your birthday or 1234." error={errors.pin?.message} {...pinProps} {...register('pin')} />
      <TextField label="New PIN again" error={errors.pinAgain?.message} {...pinProps} {...register('pinAgain')} />
      <TextField
        label="Your password"
        type="password"
        autoComplete="current-password"
        help="We ask for it so that nobody can set a PIN on an unattended screen."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isPending={setPin.isPending} pendingLabel="Saving…" className="self-start">
        Save PIN
      </Button>
    </form>
  );
}
