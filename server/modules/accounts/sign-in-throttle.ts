/**
 * Counts failed sign-ins per e-mail address (a sliding window) so that guessing one account's
 * password from many addresses is slowed down too; the auth library's own limit is per address.
 * Kept in memory: enough for one server process. Several processes would each keep their own
 * count, so a shared store (a table) would be needed before scaling out.
 */
export type SignInThrottleOptions = { maxFailures: number; windowMs: number; now?: () => number };

export function createSignInThrottle({ maxFailures, windowMs, now = Date.now }: SignInThrottleOptions) {
  const attempts = new Map<string, number[]>();

  const recent = (key: string) => {
    const cutoff = now() - windowMs;
    const list = (attempts.get(key) ?? []).filter((t) => t > cutoff);
    if (list.length) attempts.set(key, list);
    else attempts.delete(key);
    return list;
  };

  const prune = () => {
    if (attempts.size < 10_000) return;
    for (const key of [...attempts.keys()]) recent(key);
  };

  return {
    /** Seconds until the next try is allowed, or 0 when the account may try now. */
    waitSeconds(key: string): number {
      const list = recent(key);
      if (list.length < maxFailures) return 0;
      return Math.max(1, Math.ceil((list[list.length - maxFailures] + windowMs - now()) / 1000));
    },
    /**
     * Marks an attempt as started. It counts as a failure at once, so many parallel guesses cannot
     * slip past the limit; `settle` takes it back unless the password was wrong.
     */
    begin(key: string) {
      prune();
      const at = now();
      attempts.set(key, [...recent(key), at]);
      return {
        settle(outcome: 'wrong-password' | 'signed-in' | 'other') {
          if (outcome === 'wrong-password') return;
          if (outcome === 'signed-in') { attempts.delete(key); return; }
          const list = attempts.get(key);
          const i = list?.indexOf(at) ?? -1;
          if (list && i >= 0) list.splice(i, 1);
        },
      };
    },
  };
}

export type SignInThrottle = ReturnType<typeof createSignInThrottle>;
