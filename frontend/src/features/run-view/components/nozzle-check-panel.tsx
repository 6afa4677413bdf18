import { useState } from 'react';

import type { StepRecordView } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';
import { writeDrafts } from '../utils/write-drafts';
import { benchButton } from './bench-button-styles';
import { PhotoPicker } from './photo-picker';

type NozzleCheckPanelProps = { stepId: string; isRequired: boolean; record: StepRecordView; canRecord: boolean };

/** The nozzle check print before a pass: passed or failed, with a photo of the pattern if wanted. */
export function NozzleCheckPanel({ stepId, isRequired, record, canRecord }: NozzleCheckPanelProps) {
  const { run, record: keep, isWorkable } = useBench();
  const [photos, setPhotos] = useState<File[]>([]);
  const check = record.nozzleCheck;

  const save = async (passed: boolean) => {
    const photo = photos[0];
    const upload = photo ? await keep(writeDrafts.uploadPhoto(run.id, stepId, photo)) : null;
    if (photo && !upload) return;
    const saved = await keep(writeDrafts.nozzleCheck(run.id, stepId, passed, upload ? upload.id : null));
    if (saved) setPhotos([]);
  };

  return (
    <section aria-labelledby={`nozzle-${stepId}`} className="flex flex-col gap-3 rounded-xl border-2 border-graphite-300 bg-white p-4">
      <h2 id={`nozzle-${stepId}`} className="text-[1.5rem] font-bold">
        Nozzle check{isRequired ? ' (required)' : ''}
      </h2>
      {check ? (
        <p className={`flex items-center gap-2 font-bold ${check.passed ? 'text-verdigris-800' : 'text-oxide-700'}`}>
          <Icon name={check.passed ? 'check' : 'warning'} className="size-6" />
          {check.passed ? 'Passed' : 'Failed'} at {formatDateTime(check.at)}
        </p>
      ) : (
        <p>Print the nozzle check pattern and look at every line.</p>
      )}
      {isWorkable && canRecord ? (
        <>
          <PhotoPicker photos={photos} onChange={setPhotos} max={1} label="Photo of the pattern (optional)" />
          <div className="flex flex-wrap gap-2">
            <button type="button" className={benchButton('secondary')} onClick={() => void save(true)}>
              <Icon name="check" className="size-6" />
              Nozzle check passed
            </button>
            <button type="button" className={benchButton('secondary')} onClick={() => void save(false)}>
              <Icon name="warning" className="size-6" />
              Nozzle check failed
            </button>
          </div>
        </>
      ) : null}
    </section>
  );
}
