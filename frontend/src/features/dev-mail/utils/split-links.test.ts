import { describe, expect, it } from 'vitest';

import { splitLinks } from './split-links';

describe('splitLinks', () => {
  it.each([
    ['no links here', [{ kind: 'text', text: 'no links here' }]],
    [
      'Open https://lab.example/set-password/abc_DEF-123.',
      [
        { kind: 'text', text: 'Open ' },
        { kind: 'link', href: 'https://lab.example/set-password/abc_DEF-123' },
        { kind: 'text', text: '.' },
      ],
    ],
    [
      '(see http://127.0.0.1:5173/pin?x=1)\nthen https://a.example',
      [
        { kind: 'text', text: '(see ' },
        { kind: 'link', href: 'http://127.0.0.1:5173/pin?x=1' },
        { kind: 'text', text: ')\nthen ' },
        { kind: 'link', href: 'https://a.example' },
      ],
    ],
    ['javascript:alert(1) and data:text/html,x stay text', [{ kind: 'text', text: 'javascript:alert(1) and data:text/html,x stay text' }]],
  ])('when the text is %j, then the parts are as expected', (text, expected) => {
    expect(splitLinks(text)).toEqual(expected);
  });
});
