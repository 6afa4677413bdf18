import { describe, expect, it } from 'vitest';

import { safeNextPath, signInPath } from './sign-in-path';

describe('safeNextPath', () => {
  it.each([
    ['/people?sort=role', '/people?sort=role'],
    ['/', '/'],
    [null, '/'],
    ['', '/'],
    ['https://elsewhere.example/', '/'],
    ['//elsewhere.example/', '/'],
    ['/\\elsewhere.example', '/'],
    ['people', '/'],
  ])('when next is %j, then the person goes to %j', (next, expected) => {
    expect(safeNextPath(next)).toBe(expected);
  });
});

describe('signInPath', () => {
  it.each([
    [{ pathname: '/audit', search: '?page=2' }, '/sign-in?next=%2Faudit%3Fpage%3D2'],
    [{ pathname: '/' }, '/sign-in'],
    [{ pathname: '/sign-in', search: '?next=%2Fpeople' }, '/sign-in'],
    [undefined, '/sign-in'],
  ])('when coming from %j, then the sign-in address is %s', (from, expected) => {
    expect(signInPath(from)).toBe(expected);
  });
});
