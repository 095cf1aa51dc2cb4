import { describe, expect, it } from 'vitest';
import { indexTerms, queryTerms, tokenize } from '@/lib/search/normalize';
import { highlight, snippet } from '@/lib/search/snippet';

const only = (s: string) => queryTerms(s);
const meets = (query: string, text: string) => queryTerms(query).every((t) => indexTerms(text).includes(t));

describe('search text pipeline', () => {
  it('writes every spelling of ¾-inch pipe as one size', () => {
    // ¾" = DN 20 and 19.05 mm: nominal pipe size table of ASME B36.10M-2018 and ISO 6708:1995; 1 in = 25.4 mm exactly (international yard and pound, 1959)
    for (const s of [
      '3/4 inch',
      '3/4"',
      '¾"',
      '¾ inch',
      '0.75 in',
      '0.75-inch',
      '19 mm',
      '19mm',
      '20 mm',
      'DN20',
      'DN 20',
      'dn20',
    ])
      expect(only(s), s).toEqual(['dn20']);
  });

  it('tells other sizes apart', () => {
    // ½" = DN 15, 1" = DN 25, 1¼" = DN 32: ASME B36.10M-2018 / ISO 6708:1995
    expect(only('1/2 inch')).toEqual(['dn15']);
    expect(only('1-inch pump')).toEqual(['dn25', 'pump']);
    expect(only('25.4 mm')).toEqual(['dn25']);
    for (const s of ['1 1/4"', '1-1/4 inch', '1¼ in', '32 mm', 'DN32']) expect(only(s), s).toEqual(['dn32']);
  });

  it('keeps the size words out of the stop-word list ("in" is a stop word)', () => {
    expect(only('pipe in the creek')).toEqual(['pipe', 'creek']);
    expect(only('2 in pipe')).toEqual(['dn50', 'pipe']);
  });

  it('matches lengths, flows and pressures across unit systems', () => {
    // 1 ft = 0.3048 m exactly (international yard and pound, 1959): 4 ft = 1.219 m
    expect(meets('4 ft', 'a fall of 1.2 m')).toBe(true);
    // 29 ft = 8.84 m
    expect(meets('29 feet', 'lift 8.8 m')).toBe(true);
    // 30 ft = 9.14 m: within one step of two significant figures of 9 m; 36 ft = 10.97 m is not (common practice, no source: the rounding rule)
    expect(meets('9 m', 'lift 30 ft')).toBe(true);
    expect(meets('9 m', 'lift 36 ft')).toBe(false);
    // 1 US gal = 3.785411784 L (NIST Handbook 44, 2023, Appendix C): 2 gal/min = 7.57 L/min
    expect(meets('2 gpm', 'delivers 7.6 L/min')).toBe(true);
    expect(meets('7.6 l/min', 'about 2 gal/min')).toBe(true);
    // 1 psi = 6.894757 kPa (NIST SP 811, 2008): 10 psi = 68.9 kPa
    expect(meets('10 psi', 'rated 69 kPa')).toBe(true);
    expect(meets('4 ft', '4 m')).toBe(false);
  });

  it('folds the trade’s synonyms to one word', () => {
    expect(only('supply head')).toEqual(only('fall'));
    expect(only('delivery head')).toEqual(only('lift'));
    expect(only('impulse valve')).toEqual(only('waste valve'));
    expect(only('waste valves')).toEqual(only('waste valve'));
    expect(only('pressure tank')).toEqual(only('air chamber'));
    expect(only('drive line')).toEqual(only('drive pipe'));
    expect(only('drive-pipe')).toEqual(only('drive pipe'));
  });

  it('stems English words (Porter) and drops stop-words', () => {
    expect(only('stopped stopping stops')).toEqual(['stop']);
    expect(only('the creek drops')).toEqual(['creek', 'drop']);
    expect(only('Has anyone had a 1-inch pump stop when the creek drops?')).toEqual([
      'anyon',
      'dn25',
      'pump',
      'stop',
      'creek',
      'drop',
    ]);
  });

  it('keeps offsets into the original text for highlighting', () => {
    const text = 'Drive pipe is 12 ft of ¾" PVC.';
    const t = tokenize(text);
    expect(t.map((x) => text.slice(x.start, x.end))).toEqual(['Drive pipe', '12 ft', '¾"', 'PVC']);
    expect(
      highlight(text, new Set(queryTerms('19 mm drive line')))
        .filter((s) => s.hit)
        .map((s) => s.text),
    ).toEqual(['Drive pipe', '¾"']);
  });

  it('cuts a snippet around the matches and marks them', () => {
    const long = `${'Filler words about nothing in particular. '.repeat(20)}The waste valve stuck when the creek dropped. ${'More filler text here. '.repeat(20)}`;
    const s = snippet(long, new Set(queryTerms('impulse valve creek')), 120);
    const text = s.map((x) => x.text).join('');
    expect(text.startsWith('… ')).toBe(true);
    expect(text.length).toBeLessThan(130);
    expect(s.filter((x) => x.hit).map((x) => x.text)).toEqual(['waste valve', 'creek']);
  });
});
