import { zodResolver } from '@hookform/resolvers/zod';
import type { ReactNode } from 'react';
import { useForm } from 'react-hook-form';

import { ROLE_LABELS, SignatureInputSchema, type Session } from '@tracewright/shared';

import { type ApiError, isApiError } from '../../lib/api-error';
import { applyApiErrorToForm } from '../../lib/form-errors';
import { FormError } from '../ui/form-error';
import { ModalDialog } from '../ui/modal-dialog';
import { TextField } from '../ui/text-field';
import { DialogActions } from '../ui/dialog-actions';

const PasswordSchema = SignatureInputSchema.pick({ password: true });

type SignatureDialogProps = {
  title: string;
  /** What the signature means, in words the signer agrees to. */
  meaning: string;
  signer: Session['user'];
  /** The hash of the exact record version being signed, when the record has one. */
  contentHash: string | null;
  signLabel: string;
  /** What is being signed, in short. */
  children?: ReactNode;
  onSign: (password: string) => Promise<unknown>;
  onSigned: () => void;
  onClose: () => void;
  /** A 400 about fields outside this dialog: return true when the caller has shown it there. */
  onInvalid?: (error: ApiError) => boolean;
};

/** The password message of a refused signature: the server's field message, else its message. */
function passwordMessage(error: ApiError): string {
  return error.flattened?.fieldErrors.password?.join(' ') || error.message;
}

/** An e-signature: who signs, what it means, which record, and the password entered again. */
export function SignatureDialog({ title, meaning, signer, contentHash, signLabel, children, onSign, onSigned, onClose, onInvalid }: SignatureDialogProps) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(PasswordSchema), defaultValues: { password: '' } });

  const onSubmit = handleSubmit(async ({ password }) => {
    try {
      await onSign(password);
    } catch (error) {
      // 401 on a signature means the password was wrong: say so where it is typed again.
      if (isApiError(error, 401)) setError('password', { type: 'server', message: passwordMessage(error) });
      else if (isApiError(error, 400) && onInvalid?.(error)) return;
      else applyApiErrorToForm(error, setError, ['password']);
      return;
    }
    onSigned();
  });

  return (
    <ModalDialog title={title} onClose={onClose}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        {children}
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2">
          <dt className="font-bold">Signer</dt>
          <dd>
            {signer.name} ({ROLE_LABELS[signer.role].name})
          </dd>
          <dt className="font-bold">Meaning</dt>
          <dd>{meaning}</dd>
          <dt className="font-bold">Record</dt>
          <dd className="break-all font-mono text-xs">{contentHash ?? 'as it stands when you sign'}</dd>
          <dt className="font-bold">Date and time</dt>
          <dd>Taken by the server when you sign.</dd>
        </dl>
        <FormError message={errors.root?.server?.message} />
        <TextField
          label="Your password"
          type="password"
          autoComplete="current-password"
          help="Entering it signs in your name, with the meaning above."
          error={errors.password?.message}
          {...register('password')}
        />
        <DialogActions isPending={isSubmitting} pendingLabel="Signing…" onCancel={onClose}>
          {signLabel}
        </DialogActions>
      </form>
    </ModalDialog>
  );
}
