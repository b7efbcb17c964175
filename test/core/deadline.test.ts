import { describe, expect, it } from 'vitest';
import { checkDeadline, Deadline, TimeLimitExceeded, withDeadline } from '../../src/core/deadline.js';

/** A clock that moves only when told. */
function manualClock(): { now: () => number; advance: (ms: number) => void } {
  let t = 1000;
  return { now: () => t, advance: (ms) => (t += ms) };
}

describe('Deadline', () => {
  it('passes until the limit, then throws at every check with the stage and the time spent', () => {
    const clock = manualClock();
    const deadline = new Deadline(500, clock.now);
    deadline.check('fold pass');
    clock.advance(500);
    deadline.check('fold pass'); // exactly at the limit: not yet past it
    expect(deadline.expired()).toBe(false);
    clock.advance(1);
    expect(deadline.expired()).toBe(true);
    const error = (() => {
      try {
        deadline.check('swing scan');
      } catch (e) {
        return e;
      }
      return null;
    })();
    expect(error).toBeInstanceOf(TimeLimitExceeded);
    expect(error).toMatchObject({ limitMs: 500, elapsedMs: 501, stage: 'swing scan' });
    expect(() => deadline.check('charts')).toThrow(TimeLimitExceeded);
  });

  it('checkDeadline does nothing outside withDeadline', () => {
    expect(() => checkDeadline('anything')).not.toThrow();
  });

  it('checkDeadline sees the deadline of its own work across awaits, and never another one', async () => {
    const clock = manualClock();
    const expired = new Deadline(10, clock.now);
    const open = new Deadline(1e9, clock.now);
    clock.advance(20);
    const seen: string[] = [];
    const work = (label: string) => async (): Promise<void> => {
      for (let step = 0; step < 3; step++) {
        await new Promise((resolve) => setTimeout(resolve, 1));
        try {
          checkDeadline(label);
          seen.push(`${label} ok`);
        } catch (error) {
          seen.push(`${label} ${(error as TimeLimitExceeded).stage} stopped`);
        }
      }
    };
    // Both run interleaved on one thread; each check reads only its own deadline.
    await Promise.all([withDeadline(expired, work('a')), withDeadline(open, work('b'))]);
    expect(seen.filter((s) => s.startsWith('a'))).toEqual(['a a stopped', 'a a stopped', 'a a stopped']);
    expect(seen.filter((s) => s.startsWith('b'))).toEqual(['b ok', 'b ok', 'b ok']);
  });
});
