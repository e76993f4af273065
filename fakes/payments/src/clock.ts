/**
 * The fake's own clock: wall-clock time plus an offset that tests can push
 * forward (never back). Object timestamps, session expiry and idempotency
 * lifetimes all read this clock; webhook signatures use the real wall clock,
 * because receivers check them against theirs.
 */
export class FakeClock {
  private offset = 0;

  /** Unix time in whole seconds, as the service reports it. */
  now(): number {
    return Math.floor(Date.now() / 1000) + this.offset;
  }

  get offsetSeconds(): number {
    return this.offset;
  }

  advance(seconds: number): void {
    if (!Number.isInteger(seconds) || seconds < 0) {
      throw new RangeError('the clock moves forward by a whole, non-negative number of seconds');
    }
    this.offset += seconds;
  }

  reset(): void {
    this.offset = 0;
  }
}
