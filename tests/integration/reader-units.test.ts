/**
 * Server-drawn numbers in the reader's units (real MariaDB): a question asked in metric reads
 * in feet and gallons to a US reader, and the reverse, on its site sheet and in search.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { GET as searchGET } from '@/app/api/search/route';
import { POST as askPOST } from '@/app/api/questions/route';
import { loadThread } from '@/lib/questions/thread';
import { siteSheetRows } from '@/lib/calculators/site-sheet';
import { rebuildIndex, type SearchItem } from '@/lib/search';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.31.0');

async function searchAs(units: 'US' | 'metric', q: string): Promise<SearchItem[]> {
  const res = await searchGET(
    new NextRequest(`http://localhost/api/search?q=${encodeURIComponent(q)}`, {
      headers: { cookie: `cw_units=${units}` },
    }),
  );
  expect(res.status).toBe(200);
  return ((await res.json()) as { items: SearchItem[] }).items;
}
const text = (i: SearchItem) => [...i.title, ...i.snippet].map((s) => s.text).join('');
const row = (rows: { label: string; value: string }[], label: string) => rows.find((r) => r.label === label)?.value;

describe('a question asked in metric, read by a US reader, and the reverse', () => {
  let metricQ: number;
  let usQ: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    await rebuildIndex();
    const metric = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Wrenhollow ram delivers a trickle after the flood',
      body: '**Weak** delivery since the flood. The friction is $h_f = f\\frac{L}{D}\\frac{v^2}{2g}$ over the line.\n\n- checked the _snifter_\n- cleaned the screen',
      tags: ['drive-pipe'],
      siteSheet: {
        fall: '1.5 m',
        lift: '16.6 m',
        driveLength: '9 m',
        driveSize: '1-1/4',
        driveMaterial: 'pvc-sch40',
        delivered: '0.9 L/min',
        deliveryLength: '90 m',
        symptoms: 'weak-delivery',
      },
    });
    expect(metric.status).toBe(201);
    metricQ = metric.body.id;
    const us = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Copperbeck ram stops at dusk',
      body: 'It beats all day and stops when the air cools.',
      tags: ['drive-pipe'],
      // a bare number is read in the site's default units (US) when the question is asked
      siteSheet: { fall: '4 ft', lift: '29', driveLength: '20 ft', delivered: '0.25 gal/min' },
    });
    expect(us.status).toBe(201);
    usQ = us.body.id;
  });

  it('the site sheet of the metric question reads in feet and gallons to a US reader', async () => {
    const t = await loadThread(metricQ, null);
    const rows = siteSheetRows(t.siteSheet, 'US');
    expect(row(rows, 'Fall')).toBe('4.92 ft'); // 1.5 m ÷ 0.3048 m/ft = 4.921 ft (NIST SP 811, 2008)
    expect(row(rows, 'Delivery line length')).toBe('295 ft'); // 90 m ÷ 0.3048 = 295.3 ft (NIST SP 811, 2008)
    // 0.9 L/min ÷ 3.785411784 L/gal × 60 = 14.27 US gal/h: under a gallon a minute reads per hour
    // (NIST SP 811, 2008 for the gallon; common practice, no source, for the hour)
    expect(row(rows, 'Delivered')).toBe('14.3 US gal/h');
    expect(row(rows, 'Drive pipe material')).toBe('PVC, schedule 40');
  });

  it('the site sheet of the US question reads in metres and litres to a metric reader', async () => {
    const t = await loadThread(usQ, null);
    const rows = siteSheetRows(t.siteSheet, 'metric');
    expect(row(rows, 'Fall')).toBe('1.22 m'); // 4 ft × 0.3048 = 1.219 m (NIST SP 811, 2008)
    expect(row(rows, 'Lift')).toBe('8.84 m'); // the bare "29" is 29 ft: × 0.3048 = 8.839 m (NIST SP 811, 2008)
    // 0.25 gal/min × 3.785411784 L/gal × 60 = 56.78 L/h (NIST SP 811, 2008)
    expect(row(rows, 'Delivered')).toBe('56.8 L/h');
  });

  it('search shows the metric question in feet to a US reader, as rendered words', async () => {
    const hit = (await searchAs('US', 'wrenhollow trickle')).find((i) => i.id === `question-${metricQ}`);
    expect(hit).toBeDefined();
    const shown = text(hit!);
    expect(shown).toContain('4.92 ft'); // 1.5 m (NIST SP 811, 2008)
    expect(shown).toContain('295 ft'); // 90 m (NIST SP 811, 2008)
    expect(shown).not.toMatch(/\b90 m\b|\b1\.5 m\b/);
    expect(shown).toContain('PVC, schedule 40');
    expect(shown).not.toMatch(/pvc-sch40/);
  });

  it('search snippets are the words the thread shows: no codes, no LaTeX, no Markdown marks', async () => {
    const symptoms = (await searchAs('US', 'wrenhollow weak delivery what it does')).find(
      (i) => i.id === `question-${metricQ}`,
    );
    expect(text(symptoms!)).toContain('What it does weak delivery');
    expect(text(symptoms!)).not.toContain('weak-delivery');
    const body = (await searchAs('US', 'wrenhollow snifter friction screen')).find(
      (i) => i.id === `question-${metricQ}`,
    );
    const shown = text(body!);
    expect(shown).toContain('The friction is hf = f L/D v²/2g over the line');
    expect(shown).toContain('checked the snifter');
    expect(shown).not.toMatch(/\\frac|\$|\*\*|_snifter_|(^|\s)- /);
  });

  it('search shows the US question in metres to a metric reader', async () => {
    const hit = (await searchAs('metric', 'copperbeck dusk')).find((i) => i.id === `question-${usQ}`);
    expect(hit).toBeDefined();
    const shown = text(hit!);
    expect(shown).toContain('1.22 m'); // 4 ft × 0.3048 (NIST SP 811, 2008)
    expect(shown).toContain('6.1 m'); // 20 ft × 0.3048 = 6.096 m (NIST SP 811, 2008)
    expect(shown).not.toMatch(/\b4 ft\b|\b20 ft\b/);
  });
});
