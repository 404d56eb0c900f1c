// Synchronous speed of an AC motor: n = 120 · f / p (r/min), f in Hz, p the number of poles.

export function synchronousRpm(hz: number, poles: number): number {
  if (!(poles >= 2) || poles % 2 !== 0) throw new RangeError(`poles must be an even number of at least 2 (got ${poles})`);
  return (120 * hz) / poles;
}
