import { useState } from 'react';
import { Controller } from 'react-hook-form';

import { TextAreaField } from '../../../components/ui/text-area-field';
import { fieldError, type StepFormApi } from '../utils/step-form-types';

const toNotes = (text: string) =>
  text
    .split('\n')
    .map((line) => line.trim())
    .filter(Boolean);

/** The engineer's own cautions, one per line; the form keeps them as a list. */
export function CustomSafetyNotes({ form }: { form: StepFormApi }) {
  return (
    <Controller
      control={form.control}
      name="safetyNotes"
      render={({ field }) => <NotesText initial={field.value} error={fieldError(form, 'safetyNotes')} onChange={field.onChange} onBlur={field.onBlur} />}
    />
  );
}

type NotesTextProps = { initial: unknown; error?: string; onChange: (notes: string[]) => void; onBlur: () => void };

// The text stays as typed (blank lines and all) while the list behind it follows.
function NotesText({ initial, error, onChange, onBlur }: NotesTextProps) {
  const [text, setText] = useState(() => (Array.isArray(initial) ? initial.join('\n') : ''));
  return (
    <TextAreaField
      label="Your own safety notes"
      help="One note per line. They are shown with the cautions above."
      rows={3}
      error={error}
      value={text}
      onBlur={onBlur}
      onChange={(event) => {
        setText(event.target.value);
        onChange(toNotes(event.target.value));
      }}
    />
  );
}
