import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { ROLE_LABELS, type Session, ReleaseVersionInputSchema, type RecipeVersionView } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-error';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useReleaseVersion } from '../api/release-version';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { DialogActions } from '../../../components/ui/dialog-actions';

type ReleaseDialogProps = { view: RecipeVersionView; signer: Session['user']; onReleased: () => void; onClose: () => void };

/** The e-signature that releases a version: who signs, what it means, and the password again. */
export function ReleaseDialog({ view, signer, onReleased, onClose }: ReleaseDialogProps) {
  const release = useReleaseVersion();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(ReleaseVersionInputSchema),
    defaultValues: { password: '', meaning: 'approved for production' as const, contentHash: view.contentHash },
  });

  const onSubmit = handleSubmit((input) =>
    release.mutate(
      { versionId: view.id, input },
      {
        onSuccess: onReleased,
        onError: (error) => {
          // 401 here means the password was not right: say so where it is typed again.
          if (isApiError(error, 401)) setError('password', { type: 'server', message: error.message });
          else applyApiErrorToForm(error, setError, ['password']);
        },
      },
    ),
  );

  return (
    <ModalDialog title={`Release version ${view.number} of ${view.recipe.code}`} onClose={onClose}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2">
          <dt className="font-bold">Signed by</dt>
          <dd>
            {signer.name} ({ROLE_LABELS[signer.role].name})
          </dd>
          <dt className="font-bold">Meaning</dt>
          <dd>Approved for production</dd>
          <dt className="font-bold">Content</dt>
          <dd className="break-all font-mono text-sm">{view.contentHash.slice(0, 16)}…</dd>
        </dl>
        <p className="text-graphite-800">
          Operators will run this exact content from now on. A version released before it is retired.
        </p>
        <FormError message={errors.root?.server?.message} />
        <TextField label="Your password" type="password" autoComplete="current-password" help="Entering it signs the release in your name." error={errors.password?.message} {...register('password')} />
        <DialogActions isPending={release.isPending} pendingLabel="Signing…" onCancel={onClose}>
          Sign and release
        </DialogActions>
      </form>
    </ModalDialog>
  );
}
