import { useId, useState, type ChangeEvent } from 'react';

import { Icon } from '../../../components/icons/icon';
import { useObjectUrls } from '../hooks/use-object-urls';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';

const TYPES = ['image/jpeg', 'image/png', 'image/webp'];

type PhotoPickerProps = { photos: File[]; onChange: (photos: File[]) => void; max?: number; label?: string };

/**
 * Photos from the tablet's back camera (or its gallery). They are kept in the outbox with the
 * write that uses them, so a photo taken offline is uploaded first when the network is back.
 */
export function PhotoPicker({ photos, onChange, max = 10, label = 'Take a photo' }: PhotoPickerProps) {
  const id = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const urls = useObjectUrls(photos);

  const add = (event: ChangeEvent<HTMLInputElement>) => {
    const picked = [...(event.target.files ?? [])];
    event.target.value = '';
    const usable = picked.filter((f) => TYPES.includes(f.type));
    setProblem(usable.length < picked.length ? 'Only JPEG, PNG or WebP photos can be kept.' : null);
    const next = [...photos, ...usable];
    if (next.length > max) setProblem(`At most ${max} photo${max === 1 ? '' : 's'}.`);
    onChange(next.slice(0, max));
  };

  return (
    <div className="flex flex-col gap-2">
      {photos.length < max ? (
        <label htmlFor={id} className={benchButton('secondary', 'cursor-pointer self-start focus-within:outline-3 focus-within:outline-copper-600')}>
          <BenchIcon name="camera" />
          {label}
          <input id={id} type="file" accept="image/*" capture="environment" multiple={max > 1} onChange={add} className="sr-only" />
        </label>
      ) : null}
      {problem ? <p className="font-bold text-oxide-700">{problem}</p> : null}
      {photos.length > 0 ? (
        <ul className="flex flex-wrap gap-2" aria-label="Photos">
          {photos.map((photo, i) => (
            <li key={`${photo.name}-${i}`} className="flex flex-col items-center gap-1">
              {urls[i] ? <img src={urls[i] ?? undefined} alt={`Photo ${i + 1}`} className="size-24 rounded-lg border-2 border-graphite-300 object-cover" /> : <span className="text-base">Photo {i + 1}</span>}
              <button type="button" className={benchButton('quiet', '', 'compact')} onClick={() => onChange(photos.filter((_, j) => j !== i))} aria-label={`Remove photo ${i + 1}`}>
                <Icon name="trash" className="size-5" />
                Remove
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
