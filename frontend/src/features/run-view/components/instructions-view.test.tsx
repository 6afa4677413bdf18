import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { InstructionsView } from './instructions-view';

describe('InstructionsView', () => {
  it('when instructions hold paragraphs, "- " lists and typed markup, then they show as text and never as HTML', () => {
    const { container } = render(<InstructionsView text={'Lay the sheet flat.\nTape the corners.\n\n- Close the door\n- <b>Do not</b> open it early <img src=x onerror=alert(1)>'} />);

    expect(screen.getByRole('list')).toHaveTextContent('Close the door');
    expect(screen.getByText('<b>Do not</b> open it early <img src=x onerror=alert(1)>')).toBeInTheDocument();
    expect(container.querySelector('b, img')).toBeNull();
    expect(container.querySelector('p')?.innerHTML).toBe('Lay the sheet flat.<br>Tape the corners.');
  });
});
