import { useCallback, useEffect, useRef } from 'react';
import { useSearchParams } from 'react-router';

import { runProgress, type RecipeStep } from '@tracewright/shared';

import type { BenchRun } from '../utils/bench-run';

/**
 * The step on screen: the one in the address (`?step=`, so a reload stays put), else the run's
 * current step by the shared rule. Moving to another step brings its title into focus.
 */
export function useStepChoice(run: BenchRun): { step: RecipeStep | null; index: number; goToStep: (stepId: string) => void } {
  const [params, setParams] = useSearchParams();
  const steps = run.content.steps;
  const asked = params.get('step');
  const chosen = steps.find((s) => s.id === asked) ?? steps.find((s) => s.id === runProgress(steps, run.steps).currentStepId) ?? steps[0] ?? null;
  const index = chosen ? steps.indexOf(chosen) : -1;
  const hasMoved = useRef(false);

  const goToStep = useCallback(
    (stepId: string) => {
      hasMoved.current = true;
      setParams((current) => {
        const next = new URLSearchParams(current);
        next.set('step', stepId);
        return next;
      });
    },
    [setParams],
  );

  useEffect(() => {
    if (!hasMoved.current) return;
    window.scrollTo?.({ top: 0 });
    document.getElementById('step-title')?.focus();
  }, [chosen?.id]);

  return { step: chosen, index, goToStep };
}
