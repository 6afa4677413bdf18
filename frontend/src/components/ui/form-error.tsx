import { Icon } from '../icons/icon';

/** A problem with the whole form (wrong password, too many tries, server trouble), read out at once. */
export function FormError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <div role="alert" className="flex items-start gap-2 rounded-md border-2 border-oxide-700 bg-oxide-50 p-3 text-oxide-800">
      <Icon name="blocked" className="mt-0.5 size-5" />
      <p className="font-bold">{message}</p>
    </div>
  );
}
