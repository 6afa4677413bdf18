import { Icon } from '../icons/icon';

type FieldMessageProps = { id: string; help?: string; error?: string; helpId: string };

/** Help under the field, then the problem (if any); both are wired to the field by id. */
export function FieldMessage({ id, help, error, helpId }: FieldMessageProps) {
  return (
    <>
      {help ? (
        <p id={helpId} className="text-sm text-graphite-600">
          {help}
        </p>
      ) : null}
      {error ? (
        <p id={id} className="flex items-start gap-1.5 text-sm font-bold text-oxide-700">
          <Icon name="blocked" className="mt-0.5 size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </>
  );
}
