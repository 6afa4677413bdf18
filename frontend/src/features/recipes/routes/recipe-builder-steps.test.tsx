import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';

import { cardNames, renderBuilder, sequence } from '../testing/render-builder';

describe('recipe builder: the sequence', () => {
  it('when a step kind is added from the palette with the keyboard, then a card appears after the selected step and is selected', async () => {
    const { user } = await renderBuilder();

    screen.getByRole('button', { name: 'Add Inspect step' }).focus();
    await user.keyboard('{Enter}');

    expect(cardNames()).toEqual(['Step 1: Print silver traces', 'Step 2: Inspect', 'Step 3: Cure silver', 'Step 4: Look over the traces']);
    expect(within(sequence()).getByRole('button', { name: 'Step 2: Inspect' })).toHaveAttribute('aria-current', 'true');
    expect(screen.getByRole('heading', { level: 2, name: 'Step 2: Inspect' })).toBeInTheDocument();
    expect(within(sequence()).getByRole('status')).toHaveTextContent('Added Inspect as step 2 of 4');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();
  });

  it('when Move down and Move up are pressed on the selected card, then the order changes and the focus stays on the button', async () => {
    const { user } = await renderBuilder();

    await user.click(within(sequence()).getByRole('button', { name: 'Move down' }));
    expect(cardNames()).toEqual(['Step 1: Cure silver', 'Step 2: Print silver traces', 'Step 3: Look over the traces']);
    expect(within(sequence()).getByRole('button', { name: 'Move down' })).toHaveFocus();

    await user.click(within(sequence()).getByRole('button', { name: 'Move down' }));
    await user.click(within(sequence()).getByRole('button', { name: 'Move up' }));
    expect(cardNames()).toEqual(['Step 1: Cure silver', 'Step 2: Print silver traces', 'Step 3: Look over the traces']);
    expect(within(sequence()).getByRole('button', { name: 'Move up' })).toHaveFocus();
  });

  it('when a card is carried with the keyboard (Space, ArrowDown, Space), then it drops one place lower', async () => {
    // jsdom lays nothing out; give each card a place in a column so the keyboard sensor can find its neighbours.
    vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockImplementation(function (this: HTMLElement) {
      const card = this.closest('[data-step-card]');
      const index = card ? [...document.querySelectorAll('[data-step-card]')].indexOf(card) : -1;
      return index === -1 ? new DOMRect(0, 0, 0, 0) : new DOMRect(0, index * 100, 300, 90);
    });
    const { user } = await renderBuilder();
    within(sequence()).getByRole('button', { name: 'Move step 1, Print silver traces' }).focus();

    await user.keyboard('[Space]');
    expect(await screen.findByText('Step 1, Print silver traces would go to position 1 of 3.')).toBeInTheDocument();
    await user.keyboard('[ArrowDown]');
    expect(await screen.findByText('Step 1, Print silver traces would go to position 2 of 3.')).toBeInTheDocument();
    await user.keyboard('[Space]');

    expect(await screen.findByText('Put step 1, Print silver traces down at position 2 of 3.')).toBeInTheDocument();
    expect(cardNames()).toEqual(['Step 1: Cure silver', 'Step 2: Print silver traces', 'Step 3: Look over the traces']);
  });

  it('when the selected step is duplicated and the copy removed, then the copy comes and goes beside it', async () => {
    const { user } = await renderBuilder();

    await user.click(within(sequence()).getByRole('button', { name: 'Duplicate' }));
    expect(cardNames()).toEqual(['Step 1: Print silver traces', 'Step 2: Print silver traces (copy)', 'Step 3: Cure silver', 'Step 4: Look over the traces']);

    await user.click(within(sequence()).getByRole('button', { name: 'Remove' }));
    expect(cardNames()).toEqual(['Step 1: Print silver traces', 'Step 2: Cure silver', 'Step 3: Look over the traces']);
    expect(within(sequence()).getByRole('button', { name: 'Step 2: Cure silver' })).toHaveFocus();
  });
});
