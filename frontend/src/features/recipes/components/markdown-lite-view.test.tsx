import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { MarkdownLiteView } from './markdown-lite-view';

describe('MarkdownLiteView', () => {
  it('when the instructions contain HTML, then it is shown as text and never becomes markup', () => {
    const { container } = render(<MarkdownLiteView text={'<img src=x onerror="alert(1)"> Hot!\n\n- <b>bold?</b>\n- <script>alert(2)</script>'} />);

    expect(screen.getByText('<img src=x onerror="alert(1)"> Hot!')).toBeInTheDocument();
    expect(screen.getByText('<b>bold?</b>')).toBeInTheDocument();
    expect(screen.getByText('<script>alert(2)</script>')).toBeInTheDocument();
    expect(container.querySelector('img, b, script')).toBeNull();
  });

  it('when the text has paragraphs and a list, then they render as paragraphs and list items', () => {
    render(<MarkdownLiteView text={'Preheat the press.\n\n- Lay the sheet\n- Close the platen'} />);

    expect(screen.getByText('Preheat the press.').tagName).toBe('P');
    expect(screen.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['Lay the sheet', 'Close the platen']);
  });
});
