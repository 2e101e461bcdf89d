import { describe, expect, it } from 'vitest';
import { nextOccurrence, previousOccurrence, wasMissed } from './next-nightly.js';

describe('nightly times (server local time)', () => {
  const at = (h: number, m: number, day = 10) => new Date(2026, 2, day, h, m, 0, 0);

  it('picks today when the time is still ahead and tomorrow when it has passed', () => {
    expect(nextOccurrence('02:00', at(1, 30))).toEqual(at(2, 0));
    expect(nextOccurrence('02:00', at(2, 0))).toEqual(at(2, 0, 11));
    expect(nextOccurrence('02:00', at(14, 0))).toEqual(at(2, 0, 11));
    expect(nextOccurrence('23:59', at(23, 58))).toEqual(at(23, 59));
  });

  it('finds the latest past occurrence', () => {
    expect(previousOccurrence('02:00', at(14, 0))).toEqual(at(2, 0));
    expect(previousOccurrence('02:00', at(1, 0))).toEqual(at(2, 0, 9));
  });

  it('reports a missed run only when a scheduled time passed since the last start', () => {
    expect(wasMissed('02:00', at(2, 0, 9), at(8, 0))).toBe(true); // server was down at 02:00 on the 10th
    expect(wasMissed('02:00', at(2, 0), at(8, 0))).toBe(false);
    expect(wasMissed('02:00', at(1, 0), at(1, 30))).toBe(false);
    expect(wasMissed('02:00', null, at(8, 0))).toBe(false); // a new installation has missed nothing
  });
});
