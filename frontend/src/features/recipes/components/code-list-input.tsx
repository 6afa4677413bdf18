import { useState } from 'react';
import { Controller } from 'react-hook-form';

import { TextField } from '../../../components/ui/text-field';
import { fieldError, type StepFormApi, type StepPath } from '../utils/step-form-types';

type CodeListInputProps = { form: StepFormApi; name: StepPath; label: string; help: string };

const split = (text: string) =>
  text
    .split(/[,\s]+/)
    .map((code) => code.trim().toUpperCase())
    .filter(Boolean);

/** Codes typed as one line ("H225, H319"); the form keeps them as a list. */
export function CodeListInput({ form, name, label, help }: CodeListInputProps) {
  return (
    <Controller
      control={form.control}
      name={name}
      render={({ field }) => <CodeListText label={label} help={help} error={fieldError(form, name)} initial={field.value} onChange={(codes) => field.onChange(codes)} onBlur={field.onBlur} />}
    />
  );
}

type CodeListTextProps = { label: string; help: string; error?: string; initial: unknown; onChange: (codes: string[]) => void; onBlur: () => void };

// The text stays as typed (commas, spaces) while the list behind it follows each keystroke.
function CodeListText({ label, help, error, initial, onChange, onBlur }: CodeListTextProps) {
  const [text, setText] = useState(() => (Array.isArray(initial) ? initial.join(', ') : ''));
  return (
    <TextField
      label={label}
      help={help}
      error={error}
      autoComplete="off"
      value={text}
      onBlur={onBlur}
      onChange={(event) => {
        setText(event.target.value);
        onChange(split(event.target.value));
      }}
    />
  );
}
