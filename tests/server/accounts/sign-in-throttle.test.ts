import { describe, expect, it } from 'vitest';
import { createSignInThrottle } from '../../../server/modules/accounts/sign-in-throttle';

const setup = () => {
  let clock = 1_000_000;
  const throttle = createSignInThrottle({ maxFailures: 3, windowMs: 15 * 60_000, now: () => clock });
  return { throttle, advance: (ms: number) => { clock += ms; } };
};

describe('sign-in throttle', () => {
  it('pauses an address after the set number of wrong passwords and says how long to wait', () => {
    const { throttle, advance } = setup();
    for (let i = 0; i < 3; i++) { throttle.begin('a@x.test').settle('wrong-password'); advance(60_000); }
    // The oldest failure leaves the 15-minute window 12 minutes from now.
    expect(throttle.waitSeconds('a@x.test')).toBe(12 * 60);
  });

  it('lets the account try again once the oldest failures leave the window', () => {
    const { throttle, advance } = setup();
    for (let i = 0; i < 3; i++) throttle.begin('a@x.test').settle('wrong-password');
    advance(15 * 60_000 + 1);
    expect(throttle.waitSeconds('a@x.test')).toBe(0);
  });

  it('counts attempts still in flight, so parallel guesses cannot pass the limit', () => {
    const { throttle } = setup();
    for (let i = 0; i < 3; i++) throttle.begin('a@x.test');
    expect(throttle.waitSeconds('a@x.test')).toBeGreaterThan(0);
  });

  it('forgets an attempt that ended for another reason (bad input, banned, library limit)', () => {
    const { throttle } = setup();
    for (let i = 0; i < 3; i++) throttle.begin('a@x.test').settle('other');
    expect(throttle.waitSeconds('a@x.test')).toBe(0);
  });

  it('clears the count after a successful sign-in', () => {
    const { throttle } = setup();
    throttle.begin('a@x.test').settle('wrong-password');
    throttle.begin('a@x.test').settle('wrong-password');
    throttle.begin('a@x.test').settle('signed-in');
    throttle.begin('a@x.test').settle('wrong-password');
    throttle.begin('a@x.test').settle('wrong-password');
    expect(throttle.waitSeconds('a@x.test')).toBe(0);
  });
});
