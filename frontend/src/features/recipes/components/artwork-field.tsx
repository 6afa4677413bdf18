import { useId, useState } from 'react';

import { ARTWORK_CONTENT_TYPES, ARTWORK_MAX_BYTES } from '@tracewright/shared';

import { FieldMessage } from '../../../components/ui/field-message';
import { isApiError } from '../../../lib/api-error';
import { useUploadArtwork } from '../api/upload-artwork';
import { measurePrintedFraction } from '../utils/printed-area';
import { ArtworkThumbnail } from './artwork-thumbnail';
import { NumberField } from './number-field';
import type { KindFieldsProps } from './step-fields-context';

const MEASURABLE = new Set(['image/png', 'image/svg+xml']);

function problemWith(file: File): string | null {
  if (!(ARTWORK_CONTENT_TYPES as readonly string[]).includes(file.type)) return 'Artwork must be a PNG, SVG or PDF file.';
  if (file.size > ARTWORK_MAX_BYTES) return 'Artwork can be at most 10 MiB; export it smaller and try again.';
  return null;
}

/** The layer this pass prints: uploaded, shown small, and (PNG/SVG) measured for the ink estimate. */
export function ArtworkField({ form }: KindFieldsProps) {
  const upload = useUploadArtwork();
  const [message, setMessage] = useState<{ text: string; isError: boolean } | null>(null);
  const inputId = useId();
  const fileId = form.watch('params.artworkFileId') as number | null;

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    const problem = problemWith(file);
    if (problem) return setMessage({ text: problem, isError: true });
    setMessage({ text: `Uploading ${file.name}…`, isError: false });
    try {
      const stored = await upload.mutateAsync(file);
      form.setValue('params.artworkFileId', stored.id, { shouldValidate: true, shouldDirty: true });
      if (!MEASURABLE.has(stored.contentType)) return setMessage({ text: `${stored.displayName} uploaded. Enter the printed area fraction by hand for a PDF.`, isError: false });
      const fraction = Number((await measurePrintedFraction(file)).toFixed(4));
      form.setValue('params.printedAreaFraction', fraction, { shouldValidate: true, shouldDirty: true });
      setMessage({ text: `${stored.displayName} uploaded; ${(fraction * 100).toFixed(1)} % of it carries ink.`, isError: false });
    } catch (error) {
      setMessage({ text: isApiError(error) ? error.message : 'The artwork could not be read. Try another export of it.', isError: true });
    }
  };

  return (
    <fieldset className="flex flex-col gap-4 rounded-md border border-graphite-300 p-4">
      <legend className="px-1 font-bold">Artwork</legend>
      {fileId ? <ArtworkThumbnail fileId={fileId} label="Artwork of this print pass" sizePx={160} /> : <p className="text-sm text-graphite-600">No artwork yet.</p>}
      <div className="flex flex-col gap-1">
        <label htmlFor={inputId} className="font-bold text-graphite-900">
          {fileId ? 'Replace artwork (PNG, SVG or PDF)' : 'Upload artwork (PNG, SVG or PDF)'}
        </label>
        <input id={inputId} type="file" accept=".png,.svg,.pdf,image/png,image/svg+xml,application/pdf" aria-describedby={`${inputId}-msg`} onChange={(e) => void onFile(e.target.files?.[0])} className="text-base" />
        <div id={`${inputId}-msg`} role="status">
          {message && !message.isError ? <p className="text-sm text-graphite-700">{message.text}</p> : null}
          <FieldMessage id={`${inputId}-error`} helpId={`${inputId}-help`} error={message?.isError ? message.text : undefined} />
        </div>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField form={form} name="params.printedAreaFraction" label="Printed area fraction" help="0 to 1; measured from a PNG or SVG." />
        <NumberField form={form} name="params.pieceAreaMm2" label="Piece area" unit="mm²" help="Width × height of one piece." />
      </div>
    </fieldset>
  );
}
