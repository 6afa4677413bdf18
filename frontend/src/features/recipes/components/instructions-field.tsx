import { useId } from 'react';

import { TextAreaField } from '../../../components/ui/text-area-field';
import { fieldError, type StepFormApi } from '../utils/step-form-types';
import { MarkdownLiteView } from './markdown-lite-view';

/** What the operator reads at the bench, with a preview of how it will look. */
export function InstructionsField({ form }: { form: StepFormApi }) {
  const previewId = useId();
  const text = (form.watch('instructions') as string | undefined) ?? '';
  return (
    <section className="flex flex-col gap-2">
      <TextAreaField
        label="Instructions"
        rows={6}
        help="A blank line starts a new paragraph; a line starting with “- ” is a list item."
        error={fieldError(form, 'instructions')}
        {...form.register('instructions')}
      />
      <div className="rounded-md border border-dashed border-graphite-300 bg-paper p-3">
        <h4 id={previewId} className="mb-2 text-sm font-bold text-graphite-700">
          Preview
        </h4>
        <div role="region" aria-labelledby={previewId}>
          <MarkdownLiteView text={text} />
        </div>
      </div>
    </section>
  );
}
