import { describe, expect, it } from 'vitest';
import { formatInZone } from './mail-dates.js';

// Offsets from the IANA time zone database (recalled from memory): New York is UTC-4 in summer (EDT) and
// UTC-5 in winter (EST) under the US rules of the Energy Policy Act of 2005; Kolkata is UTC+5:30 all year.
describe('dates in the reader’s time zone', () => {
  it('follows daylight saving time and names the zone', () => {
    expect(formatInZone(new Date('2026-07-01T12:00:00Z'), 'America/New_York')).toBe('Wed, 1 Jul 2026, 08:00 (America/New_York)');
    expect(formatInZone(new Date('2026-12-01T12:00:00Z'), 'America/New_York')).toBe('Tue, 1 Dec 2026, 07:00 (America/New_York)');
  });

  it('moves the date too when the zone is past midnight', () => {
    expect(formatInZone(new Date('2026-03-10T20:45:00Z'), 'Asia/Kolkata')).toBe('Wed, 11 Mar 2026, 02:15 (Asia/Kolkata)');
  });
});
