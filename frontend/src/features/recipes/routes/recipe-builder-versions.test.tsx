import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { renderBuilder } from '../testing/render-builder';
import { aContent, aRecipeDetail, aVersionSummary, aVersionView, CURE_STEP, PRINT_STEP } from '../testing/version-fixtures';

describe('recipe builder: versions', () => {
  it('when the open version is compared with the one before, then an added and a changed step are listed side by side', async () => {
    const v1 = aVersionView({ id: 10, number: 1, state: 'released', content: aContent({ steps: [PRINT_STEP, CURE_STEP] }) });
    const warmerCure = { ...CURE_STEP, params: { ...CURE_STEP.params, temperatureC: 125 } } as typeof CURE_STEP;
    const v2 = aVersionView({ id: 11, number: 2, content: aContent({ steps: [PRINT_STEP, warmerCure, aContent().steps[2] as typeof CURE_STEP] }) });
    const recipe = aRecipeDetail([aVersionSummary({ id: 11, number: 2 }), aVersionSummary({ id: 10, number: 1, state: 'released', releasedBy: { id: 7, name: 'Tove Lind' }, releasedAt: '2026-11-30T12:00:00Z' })]);
    await renderBuilder({ versions: [v1, v2], recipe });

    const table = await screen.findByRole('table', { name: /Steps of version 1 and version 2 side by side/ });
    const rows = within(table).getAllByRole('row');
    const added = rows.find((r) => within(r).queryByText('Added')) as HTMLElement;
    expect(within(added).getByText('Look over the traces')).toBeInTheDocument();
    const changed = rows.find((r) => within(r).queryByText('Changed')) as HTMLElement;
    expect(within(changed).getAllByText('Cure silver')).toHaveLength(2);
    expect(within(changed).getByRole('list', { name: 'Changes in Cure silver' })).toHaveTextContent('Temperature: 120 → 125');

    const history = screen.getByRole('list', { name: 'Version history' });
    expect(within(history).getByText(/released by Tove Lind/)).toBeInTheDocument();
  });
});
