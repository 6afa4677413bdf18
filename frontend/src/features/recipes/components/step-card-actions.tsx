import { useEffect, useRef } from 'react';

import { Button } from '../../../components/ui/button';

export type CardFocusTarget = 'move-up' | 'move-down' | 'select';

type StepCardActionsProps = {
  title: string;
  index: number;
  count: number;
  onMove: (toIndex: number) => void;
  onDuplicate: () => void;
  onRemove: () => void;
  /** After a move the same button keeps the focus, so pressing it again keeps moving the step. */
  focusTarget: CardFocusTarget | null;
  onFocused: () => void;
};

/** The selected card's actions: every drag has a plain button too. */
export function StepCardActions({ title, index, count, onMove, onDuplicate, onRemove, focusTarget, onFocused }: StepCardActionsProps) {
  const upRef = useRef<HTMLButtonElement>(null);
  const downRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (focusTarget !== 'move-up' && focusTarget !== 'move-down') return;
    const canUp = index > 0;
    const canDown = index < count - 1;
    // At either end one button goes disabled; the other one takes the focus.
    const wanted = (focusTarget === 'move-up' && canUp) || !canDown ? upRef : downRef;
    wanted.current?.focus();
    onFocused();
  }, [focusTarget, index, count, onFocused]);

  return (
    <div role="group" aria-label={`Actions for step ${index + 1}, ${title}`} className="flex flex-wrap gap-2 pt-2">
      <Button ref={upRef} variant="secondary" disabled={index === 0} onClick={() => onMove(index - 1)}>
        Move up
      </Button>
      <Button ref={downRef} variant="secondary" disabled={index === count - 1} onClick={() => onMove(index + 1)}>
        Move down
      </Button>
      <Button variant="secondary" onClick={onDuplicate}>
        Duplicate
      </Button>
      <Button variant="secondary" onClick={onRemove}>
        Remove
      </Button>
    </div>
  );
}
