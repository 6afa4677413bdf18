type TimerRingProps = { fraction: number; state: 'running' | 'ended' | 'stopped'; className?: string };

const RADIUS = 52;
const CIRCUMFERENCE = 2 * Math.PI * RADIUS;
const STROKES = { running: 'stroke-copper-600', ended: 'stroke-amber-700', stopped: 'stroke-graphite-500' };

/**
 * The ring drains as the time runs out and turns amber once it is up (the words beside it say
 * so too). The drain is a transition, which reduced motion turns off.
 */
export function TimerRing({ fraction, state, className = 'size-40' }: TimerRingProps) {
  const left = state === 'ended' ? 1 : Math.min(1, Math.max(0, fraction));
  return (
    <svg viewBox="0 0 120 120" className={`shrink-0 -rotate-90 ${className}`} aria-hidden="true" data-ring-state={state}>
      <circle cx="60" cy="60" r={RADIUS} fill="none" strokeWidth="10" className="stroke-graphite-200" />
      <circle
        cx="60"
        cy="60"
        r={RADIUS}
        fill="none"
        strokeWidth={state === 'ended' ? 14 : 10}
        strokeLinecap="round"
        strokeDasharray={CIRCUMFERENCE}
        strokeDashoffset={CIRCUMFERENCE * (1 - left)}
        className={`${STROKES[state]} motion-safe:transition-[stroke-dashoffset] motion-safe:duration-1000 motion-safe:ease-linear`}
      />
    </svg>
  );
}
