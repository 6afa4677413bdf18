import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { InviteUserInputSchema, ROLE_LABELS, ROLES, type InviteUserInput } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-error';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useInviteUser } from '../api/invite-user';

// Operator is the role most invitations are for; the admin changes it when needed.
const EMPTY: InviteUserInput = { name: '', email: '', role: 'operator' };

type InvitePersonFormProps = { onInvited: (email: string) => void; onCancel: () => void };

export function InvitePersonForm({ onInvited, onCancel }: InvitePersonFormProps) {
  const invite = useInviteUser();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    formState: { errors },
  } = useForm({ resolver: zodResolver(InviteUserInputSchema), defaultValues: EMPTY });

  const onSubmit = handleSubmit((input) =>
    invite.mutate(input, {
      onSuccess: (user) => {
        reset();
        onInvited(user.email);
      },
      onError: (error) => {
        // 409 means the address is taken: say so at the field the person has to change.
        if (isApiError(error, 409)) setError('email', { type: 'server', message: error.message });
        else applyApiErrorToForm(error, setError, ['name', 'email', 'role']);
      },
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="invite-title" className="flex max-w-md flex-col gap-5">
      <h2 id="invite-title" className="text-xl font-bold">
        Invite a person
      </h2>
      <FormError message={errors.root?.server?.message} />
      <TextField label="Name" autoComplete="off" autoFocus error={errors.name?.message} {...register('name')} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="off"
        help="The invitation link goes to this address."
        error={errors.email?.message}
        {...register('email')}
      />
      <SelectField label="Role" help={ROLE_LABELS[watch('role')].summary} error={errors.role?.message} {...register('role')}>
        {ROLES.map((role) => (
          <option key={role} value={role}>
            {ROLE_LABELS[role].name}
          </option>
        ))}
      </SelectField>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" isPending={invite.isPending} pendingLabel="Sending…">
          Send invitation
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
