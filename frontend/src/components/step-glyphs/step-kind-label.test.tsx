import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { STEP_KIND_LABELS, STEP_KINDS } from '@tracewright/shared';

import { STEP_GLYPH_PATHS } from './step-glyph-paths';
import { StepKindLabel } from './step-kind-label';

describe('step kind glyphs', () => {
  it('when each kind is labelled, then its name is the text and its glyph stays silent', () => {
    render(
      <ul>
        {STEP_KINDS.map((kind) => (
          <li key={kind}>
            <StepKindLabel kind={kind} />
          </li>
        ))}
      </ul>,
    );

    expect(screen.getAllByRole('listitem').map((li) => li.textContent)).toEqual(STEP_KINDS.map((kind) => STEP_KIND_LABELS[kind]));
    expect(document.querySelectorAll('svg[aria-hidden="true"]')).toHaveLength(STEP_KINDS.length);
  });

  it('when the seven glyphs are compared, then no two are drawn alike', () => {
    const drawings = STEP_KINDS.map((kind) => STEP_GLYPH_PATHS[kind].join(' '));
    expect(new Set(drawings).size).toBe(STEP_KINDS.length);
  });
});
