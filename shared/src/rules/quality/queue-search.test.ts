import { describe, expect, it } from 'vitest';

import { textSearchPlan } from './queue-search';

describe('textSearchPlan', () => {
  it.each([
    { q: 'silver', booleanQuery: '+silver*', likeWords: [] },
    { q: 'Silver CURE', booleanQuery: '+silver* +cure*', likeWords: [] },
    { q: 'silver cure Ag', booleanQuery: '+silver* +cure*', likeWords: ['ag'] },
    { q: 'the oven', booleanQuery: '+oven*', likeWords: ['the'] },
    { q: 'Ω', booleanQuery: null, likeWords: ['ω'] },
    { q: '+heat -press "x" (dry*)', booleanQuery: '+heat* +press* +dry*', likeWords: ['x'] },
    { q: 'R-2026-0007', booleanQuery: '+2026* +0007*', likeWords: ['r'] },
    { q: 'résistance résistance', booleanQuery: '+résistance*', likeWords: [] },
    { q: '   ', booleanQuery: null, likeWords: [] },
  ])('when the search is “$q”, then the index gets $booleanQuery and LIKE gets $likeWords', ({ q, booleanQuery, likeWords }) => {
    expect(textSearchPlan(q)).toEqual({ booleanQuery, likeWords });
  });
});
