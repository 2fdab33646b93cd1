export type DelayPolicy = { freeFailures: number; baseDelayMs: number; maxDelayMs: number; windowMs: number };

// A few typos cost nothing; after that each failure doubles the wait, capped so the owner is slowed, never shut out.
export const DEFAULT_DELAY: DelayPolicy = { freeFailures: 3, baseDelayMs: 250, maxDelayMs: 5000, windowMs: 15 * 60 * 1000 };

// Bounded so a flood of made-up e-mail addresses cannot grow memory without end.
const MAX_TRACKED = 10_000;

export type AccountDelay = ReturnType<typeof accountDelay>;

export function accountDelay(policy: DelayPolicy = DEFAULT_DELAY, clock = () => Date.now()) {
  const failures = new Map<string, { count: number; since: number }>();
  const live = (key: string) => {
    const entry = failures.get(key);
    if (entry && clock() - entry.since <= policy.windowMs) return entry;
    failures.delete(key);
    return undefined;
  };
  return {
    delayMs(key: string): number {
      const over = (live(key)?.count ?? 0) - policy.freeFailures;
      return over < 0 ? 0 : Math.min(policy.maxDelayMs, policy.baseDelayMs * 2 ** over);
    },
    failed(key: string): void {
      const entry = live(key);
      failures.delete(key);
      if (failures.size >= MAX_TRACKED) failures.delete(failures.keys().next().value!);
      failures.set(key, { count: (entry?.count ?? 0) + 1, since: entry?.since ?? clock() });
    },
    succeeded(key: string): void {
      failures.delete(key);
    },
  };
}
