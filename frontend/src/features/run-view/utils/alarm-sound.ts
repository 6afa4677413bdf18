type AudioCtor = typeof AudioContext;

let context: AudioContext | null = null;

function audioCtor(): AudioCtor | null {
  // Older Safari names it webkitAudioContext; jsdom has neither.
  const w = window as unknown as { AudioContext?: AudioCtor; webkitAudioContext?: AudioCtor };
  return w.AudioContext ?? w.webkitAudioContext ?? null;
}

/**
 * Browsers only let a page make sound after a tap; the run page calls this on the first one so
 * a timer ending later can be heard.
 */
export function unlockAlarmSound(): void {
  const Ctor = audioCtor();
  if (!Ctor) return;
  context ??= new Ctor();
  if (context.state === 'suspended') void context.resume().catch(() => undefined);
}

/** Two short beeps (880 Hz, 0.18 s each). Returns false where the browser has no Web Audio. */
export function playAlarmTone(): boolean {
  unlockAlarmSound();
  if (!context) return false;
  const start = context.currentTime;
  for (const offset of [0, 0.3]) {
    const oscillator = context.createOscillator();
    const gain = context.createGain();
    oscillator.type = 'sine';
    oscillator.frequency.value = 880;
    gain.gain.setValueAtTime(0.0001, start + offset);
    gain.gain.exponentialRampToValueAtTime(0.4, start + offset + 0.02);
    gain.gain.exponentialRampToValueAtTime(0.0001, start + offset + 0.18);
    oscillator.connect(gain).connect(context.destination);
    oscillator.start(start + offset);
    oscillator.stop(start + offset + 0.2);
  }
  return true;
}

/** A short buzz where the tablet can (most Android tablets; not iPadOS). */
export function vibrateAlarm(): void {
  if (typeof navigator.vibrate === 'function') navigator.vibrate([200, 100, 200]);
}

/** Tests start each case without the previous case's audio context. */
export function resetAlarmSoundForTests(): void {
  context = null;
}
