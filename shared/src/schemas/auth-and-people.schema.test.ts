import { describe, expect, it } from 'vitest';

import { InviteUserInputSchema, UpdateUserInputSchema } from './user.schema';
import { NewPasswordSchema, PinSchema, SignInInputSchema } from './auth.schema';
import { LabSettingsSchema } from './settings.schema';

describe('SignInInputSchema', () => {
  it('when the e-mail has capitals and spaces, then it is trimmed and lower-cased', () => {
    expect(SignInInputSchema.parse({ email: '  Rosa@Lab.Example ', password: 'x' }).email).toBe('rosa@lab.example');
  });
  it.each([
    [{ email: 'not-mail', password: 'x' }, 'email'],
    [{ email: 'a@lab.example', password: '' }, 'password'],
    [{ email: 'a@lab.example', password: 'p'.repeat(201) }, 'password'],
  ])('when the input is %j, then %s is refused', (input, field) => {
    const result = SignInInputSchema.safeParse(input);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path[0]).toBe(field);
  });
});

describe('password and PIN rules', () => {
  it.each([
    ['short', false],
    ['ten-chars!', true],
    ['x'.repeat(201), false],
  ])('when the new password is %s, then valid is %s', (pw, ok) => {
    expect(NewPasswordSchema.safeParse(pw).success).toBe(ok);
  });
  it.each([
    ['1234', true],
    ['12345678', true],
    ['123', false],
    ['123456789', false],
    ['12a4', false],
  ])('when the PIN is %s, then valid is %s', (pin, ok) => {
    expect(PinSchema.safeParse(pin).success).toBe(ok);
  });
});

describe('people', () => {
  it('when an invitation names an unknown role, then the message lists the roles', () => {
    const result = InviteUserInputSchema.safeParse({ email: 'a@lab.example', name: 'A', role: 'owner' });
    expect(result.error?.issues[0]?.message).toMatch(/admin, engineer, operator, quality/);
  });
  it('when an update changes nothing, then it is refused', () => {
    expect(UpdateUserInputSchema.safeParse({}).success).toBe(false);
  });
  it('when an update carries unknown fields, then they are dropped', () => {
    expect(UpdateUserInputSchema.parse({ role: 'quality', passwordHash: 'x' })).toEqual({ role: 'quality' });
  });
});

describe('LabSettingsSchema', () => {
  it.each([
    ['Europe/Berlin', true],
    ['UTC', true],
    ['Atlantis/Capital', false],
  ])('when the time zone is %s, then valid is %s', (timeZone, ok) => {
    expect(LabSettingsSchema.safeParse({ labName: 'Lab', timeZone, paperSize: 'A4' }).success).toBe(ok);
  });
});
