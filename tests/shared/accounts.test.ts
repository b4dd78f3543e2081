import { describe, expect, it } from 'vitest';
import { safeNextPath, signUpSchema, changePasswordSchema } from '../../shared/accounts';

describe('safeNextPath (where sign-in sends you afterwards)', () => {
  it.each([
    ['/orders', '/orders'],
    ['/slabs/12?from=list#photos', '/slabs/12?from=list#photos'],
    ['/office/users?q=a%20b', '/office/users?q=a%20b'],
  ])('keeps the same-site path %s', (input, expected) => {
    expect(safeNextPath(input, '/')).toBe(expected);
  });

  it.each([
    ['https://elsewhere.example/'],
    ['//elsewhere.example/path'],
    ['/\\elsewhere.example'],
    ['\\\\elsewhere.example'],
    ['javascript:alert(1)'],
    ['/\t/elsewhere.example'],
    ['orders'],
    [''],
    [null],
    [undefined],
  ])('falls back for %j, which could leave the site', (input) => {
    expect(safeNextPath(input, '/fallback')).toBe('/fallback');
  });
});

describe('account form schemas', () => {
  it('refuses a sign-up password shorter than 10 characters and has no role field', () => {
    const r = signUpSchema.safeParse({ name: 'Ada Burl', email: 'ada@example.test', password: 'short' });
    expect(r.success).toBe(false);
    const ok = signUpSchema.parse({ name: 'Ada Burl', email: 'ada@example.test', password: 'long enough pw', role: 'admin' });
    expect(ok).not.toHaveProperty('role');
  });

  it('points a mismatched confirmation at the confirm field', () => {
    const r = changePasswordSchema.safeParse({ currentPassword: 'x', newPassword: 'aaaaaaaaaaaa', confirmPassword: 'bbbbbbbbbbbb' });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].path).toEqual(['confirmPassword']);
  });
});
