import { useId, type ComponentProps } from 'react';

type CheckboxFieldProps = Omit<ComponentProps<'input'>, 'type'> & { label: string; help?: string };

/** A yes/no setting: the box and its words side by side, help under them. */
export function CheckboxField({ label, help, id: givenId, ...rest }: CheckboxFieldProps) {
  const generated = useId();
  const id = givenId ?? generated;
  const helpId = `${id}-help`;
  return (
    <div className="flex items-start gap-3">
      <input id={id} type="checkbox" aria-describedby={help ? helpId : undefined} className="mt-1 size-5 shrink-0 accent-copper-600" {...rest} />
      <div>
        <label htmlFor={id} className="font-bold text-graphite-900">
          {label}
        </label>
        {help ? (
          <p id={helpId} className="text-sm text-graphite-600">
            {help}
          </p>
        ) : null}
      </div>
    </div>
  );
}
