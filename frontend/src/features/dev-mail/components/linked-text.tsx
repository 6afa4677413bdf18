import { splitLinks } from '../utils/split-links';

/** Mail text as written, with its web addresses made clickable (so an invitation link can be opened). */
export function LinkedText({ text }: { text: string }) {
  return (
    <pre className="whitespace-pre-wrap break-words font-sans text-base">
      {splitLinks(text).map((part, i) =>
        part.kind === 'link' ? (
          <a key={i} href={part.href} className="break-all font-bold text-copper-700 underline underline-offset-4" rel="noreferrer">
            {part.href}
          </a>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </pre>
  );
}
