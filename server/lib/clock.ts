/** The one clock the server reads; tests replace it to move time. */
export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };
