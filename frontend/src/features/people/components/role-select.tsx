import { ROLE_LABELS, ROLES, type User } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { useToast } from '../../../components/ui/use-toast';
import { useUpdateUser } from '../api/update-user';

/** Changing the role saves at once; the toast confirms, or says why it did not. */
export function RoleSelect({ user, disabled = false }: { user: User; disabled?: boolean }) {
  const update = useUpdateUser();
  const toast = useToast();
  // Show the chosen role while it saves, rather than snapping back to the old one.
  const value = update.isPending ? (update.variables.input.role ?? user.role) : user.role;

  return (
    <SelectField
      label={`Role for ${user.name}`}
      hideLabel
      value={value}
      disabled={disabled || update.isPending}
      onChange={(e) => {
        const role = e.target.value as User['role'];
        update.mutate(
          { id: user.id, input: { role } },
          {
            onSuccess: (saved) => toast.show(`${saved.name} now has the ${ROLE_LABELS[saved.role].name} role.`),
            onError: (error) => toast.show(`Role not changed: ${error.message}`, 'blocked'),
          },
        );
      }}
    >
      {ROLES.map((role) => (
        <option key={role} value={role}>
          {ROLE_LABELS[role].name}
        </option>
      ))}
    </SelectField>
  );
}
