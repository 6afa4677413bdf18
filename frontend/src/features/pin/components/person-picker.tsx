import { ROLE_LABELS, type PinUser } from '@tracewright/shared';

type PersonPickerProps = { users: PinUser[]; onPick: (user: PinUser) => void };

export function PersonPicker({ users, onPick }: PersonPickerProps) {
  if (users.length === 0) {
    return <p className="text-lg">Nobody has set a PIN yet. Sign in with your password, then set one under “My PIN”.</p>;
  }
  return (
    <ul aria-label="People with a PIN" className="grid grid-cols-[repeat(auto-fill,minmax(12rem,1fr))] gap-3">
      {users.map((user) => (
        <li key={user.id}>
          <button
            type="button"
            onClick={() => onPick(user)}
            className="flex min-h-20 w-full flex-col items-start justify-center rounded-lg border-2 border-graphite-500 bg-white px-4 py-3 text-left hover:border-copper-600 hover:bg-copper-50"
          >
            <span className="text-xl font-bold">{user.name}</span>
            <span className="text-graphite-600">{ROLE_LABELS[user.role].name}</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
