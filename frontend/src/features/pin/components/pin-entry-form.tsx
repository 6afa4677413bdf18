import { useId, useRef, useState, type FormEvent } from 'react';

import { PinSchema, type PinUser } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { fieldClasses } from '../../../components/ui/field-styles';
import { isApiError } from '../../../lib/api-error';
import { useSwitchPerson } from '../api/switch-person';
import { PinKeypad } from './pin-keypad';

type PinEntryFormProps = { user: PinUser; onBack: () => void; onSwitched: () => void };

const MAX_DIGITS = 8;

export function PinEntryForm({ user, onBack, onSwitched }: PinEntryFormProps) {
  const [pin, setPin] = useState('');
  const [problem, setProblem] = useState<string>();
  const switchPerson = useSwitchPerson();
  const inputRef = useRef<HTMLInputElement>(null);
  const inputId = useId();

  const update = (next: string) => {
    setPin(next.replace(/\D/g, '').slice(0, MAX_DIGITS));
    setProblem(undefined);
  };

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = PinSchema.safeParse(pin);
    if (!parsed.success) {
      setProblem(parsed.error.issues[0]?.message);
      return;
    }
    switchPerson.mutate(
      { userId: user.id, pin: parsed.data },
      {
        onSuccess: onSwitched,
        onError: (error) => {
          // A wrong PIN must be typed again from scratch; keeping digits invites guessing by editing.
          setPin('');
          setProblem(isApiError(error) ? error.message : 'Switching failed. Try again.');
          inputRef.current?.focus();
        },
      },
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      <div>
        <Button variant="quiet" onClick={onBack}>
          <Icon name="arrowLeft" />
          Choose someone else
        </Button>
        <h2 className="mt-2 text-2xl font-bold">PIN for {user.name}</h2>
      </div>
      <FormError message={problem} />
      <div className="flex max-w-sm flex-col gap-1">
        <label htmlFor={inputId} className="text-lg font-bold">
          PIN
        </label>
        <input
          id={inputId}
          ref={inputRef}
          type="password"
          inputMode="numeric"
          autoComplete="off"
          autoFocus
          value={pin}
          onChange={(e) => update(e.target.value)}
          aria-invalid={problem ? true : undefined}
          className={fieldClasses(Boolean(problem), 'h-16 text-center text-3xl tracking-[0.5em]')}
        />
      </div>
      <PinKeypad
        disabled={switchPerson.isPending}
        onDigit={(d) => update(pin + d)}
        onDelete={() => update(pin.slice(0, -1))}
        onClear={() => update('')}
      />
      <Button type="submit" size="lg" className="max-w-sm" isPending={switchPerson.isPending} pendingLabel="Checking…">
        Switch to {user.name}
      </Button>
    </form>
  );
}
