import type { RecipeStep } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';
import { PrimaryAction } from './primary-action';

type ActionBarProps = { step: RecipeStep; previousId: string | null; nextId: string | null; onGo: (stepId: string) => void; onReport: () => void };

/** The bar along the bottom: move between steps, report a problem (always there), and the next action. */
export function ActionBar({ step, previousId, nextId, onGo, onReport }: ActionBarProps) {
  return (
    <nav aria-label="Step actions" className="sticky bottom-0 z-30 border-t-2 border-graphite-700 bg-paper px-3 py-3">
      <div className="flex flex-wrap items-start gap-2">
        <button type="button" className={benchButton('secondary')} disabled={!previousId} onClick={() => previousId && onGo(previousId)} aria-label="Previous step">
          <Icon name="arrowLeft" className="size-6" />
          <span className="max-sm:sr-only">Previous</span>
        </button>
        <button type="button" className={benchButton('secondary')} disabled={!nextId} onClick={() => nextId && onGo(nextId)} aria-label="Next step">
          <span className="max-sm:sr-only">Next</span>
          <BenchIcon name="arrowRight" />
        </button>
        <button type="button" className={benchButton('danger')} onClick={onReport}>
          <Icon name="warning" className="size-6" />
          Report a problem
        </button>
        <PrimaryAction step={step} />
      </div>
    </nav>
  );
}
