import { describe, expect, it } from 'vitest';
import { classifyDate, decideDateOrder, readDate } from '../../shared/domain/import-dates';
import { matchMember, type Member } from '../../shared/domain/import-people';

const now = new Date('2026-12-04T12:00:00Z');

// Date forms as lab sheets carry them (ISO 8601; day-first as in most of Europe; month-first as in the US: common practice).
describe('the day/month order of a date column', () => {
  it('is decided by any cell whose first number is above 12 (day first) or whose second is (month first)', () => {
    expect(decideDateOrder(['04/03/2021', '25/03/2021', '01/02/2020'])).toMatchObject({
      order: 'dmy',
      needsChoice: false,
    });
    expect(decideDateOrder(['04/03/2021', '03/25/2021'])).toMatchObject({ order: 'mdy', needsChoice: false });
  });

  it('asks when no cell decides, and when cells contradict each other and some are ambiguous', () => {
    expect(decideDateOrder(['04/03/2021', '01/02/2020'])).toMatchObject({
      order: null,
      needsChoice: true,
      evidence: { ambiguous: 2 },
    });
    expect(decideDateOrder(['25/03/2021', '03/25/2021', '04/03/2021'])).toMatchObject({
      order: null,
      needsChoice: true,
    });
  });

  it('needs no choice when every date is unambiguous (ISO, month names, typed date cells)', () => {
    expect(decideDateOrder(['2021-03-04', '4 Mar 2021', 'March 4, 2021', ''])).toMatchObject({
      order: null,
      needsChoice: false,
    });
    expect(classifyDate('2021-03-04')).toBe('unambiguous');
    expect(classifyDate('not a date')).toBeNull();
  });
});

describe('readDate', () => {
  it.each([
    ['2021-03-04', null, '2021-03-04'],
    ['04/03/2021', 'dmy', '2021-03-04'],
    ['04/03/2021', 'mdy', '2021-04-03'],
    ['25.3.21', null, '2021-03-25'],
    ['4 Mar 2021', null, '2021-03-04'],
    ['March 4, 2021', null, '2021-03-04'],
    ['3-12-99', 'dmy', '1999-12-03'],
  ] as const)('reads "%s" (column order %s) as %s', (cell, order, iso) => {
    expect(readDate(cell, order, now)).toEqual({ ok: true, date: iso });
  });

  it('refuses an ambiguous date without an order, an impossible one, and one in the future, saying why', () => {
    expect(readDate('04/03/2021', null, now)).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/day\/month or month\/day/),
    });
    expect(readDate('31/02/2021', 'dmy', now)).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/not a calendar date/),
    });
    expect(readDate('2030-01-01', null, now)).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/outside 1950 to today/),
    });
    expect(readDate('last Tuesday', null, now)).toMatchObject({ ok: false });
  });
});

// An invented group.
const members: Member[] = [
  { id: 1, name: 'Ada Marie Lindqvist', email: 'ada.lindqvist@example.org' },
  { id: 2, name: 'Tomás Okafor', email: 'tokafor@example.org' },
  { id: 3, name: 'Tom Berger', email: 'tb@example.org' },
  { id: 4, name: 'Tina Berger', email: 'tina@example.org' },
];

describe('matchMember', () => {
  it.each([
    ['Ada Marie Lindqvist', 1],
    ['lindqvist, ada marie', 1],
    ['AML', 1],
    ['A.L.', 1],
    ['ada.lindqvist@example.org', 1],
    ['Lindqvist', 1],
    ['Tomas Okafor', 2],
    ['TO', 2],
    ['tokafor', 2],
    ['Tom', 3],
    ['tb', 3],
    ['Tina', 4],
  ] as const)('matches "%s" to member %i', (cell, id) => {
    expect(matchMember(cell, members)?.id).toBe(id);
  });

  it('matches nobody when no member, or more than one, fits (the text is then kept as "recorded by")', () => {
    expect(matchMember('J. Smith', members)).toBeNull();
    expect(matchMember('Berger', members)).toBeNull();
    expect(matchMember('T.B.', members)).toBeNull();
    expect(matchMember('', members)).toBeNull();
  });
});
