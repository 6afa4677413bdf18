import type { ComponentProps, ReactNode } from 'react';

type ChoiceBoxProps = ComponentProps<'input'> & { children: ReactNode };

/** One radio or tick with its words, on a row tall enough to hit with a gloved finger. */
export function ChoiceBox({ children, className = '', ...input }: ChoiceBoxProps) {
  return (
    <label className={`flex min-h-11 cursor-pointer items-center gap-3 ${className}`}>
      <input className="size-5 accent-copper-600" {...input} />
      <span>{children}</span>
    </label>
  );
}
