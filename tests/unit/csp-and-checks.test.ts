import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, inlineScriptHashes } from '@/lib/http/csp';
import { isSameOriginWrite } from '@/lib/http/request-checks';
import { isCalendarDate } from '@/lib/validation/text';

describe('page CSP', () => {
  it('lists the sha256 of inline scripts only, not external scripts or JSON data blocks', () => {
    const code = 'self.__next_f.push([1,"x"])';
    const html = `<script src="/_next/a.js"></script><script>${code}</script><script type="application/ld+json">{"a":1}</script><script nonce="n">${code}</script>`;
    // CSP 3 hash source: base64 of the SHA-256 of the script text (W3C CSP Level 3, "hash-source")
    const expected = `sha256-${createHash('sha256').update(code).digest('base64')}`;
    expect(inlineScriptHashes(html)).toEqual([expected]);
  });

  it("never allows inline scripts by 'unsafe-inline' with a nonce or hashes", () => {
    const withNonce = contentSecurityPolicy({ nonce: 'abc', hashes: ['sha256-x'] });
    expect(/script-src ([^;]+)/.exec(withNonce)![1]).toBe("'self' 'nonce-abc' 'sha256-x'");
    const hashed = contentSecurityPolicy({ hashes: ['sha256-x'] });
    expect(/script-src ([^;]+)/.exec(hashed)![1]).toBe("'self' 'sha256-x'");
  });
});

describe('same-origin writes', () => {
  const req = (method: string, headers: Record<string, string>) =>
    new Request('http://127.0.0.1:3100/api/helpful', { method, headers });
  it('accepts the site origin (SITE_URL in vitest.config.mts), the Host it was sent to, and requests from no browser', () => {
    expect(isSameOriginWrite(req('POST', { origin: 'http://127.0.0.1:3100' }))).toBe(true);
    expect(isSameOriginWrite(req('POST', { origin: 'http://localhost:3000', host: 'localhost:3000' }))).toBe(true);
    expect(isSameOriginWrite(req('POST', {}))).toBe(true);
    expect(isSameOriginWrite(req('GET', { origin: 'http://evil.example' }))).toBe(true);
  });
  it('refuses another port, another scheme, a null origin and same-site fetches', () => {
    expect(isSameOriginWrite(req('POST', { origin: 'http://127.0.0.1:9999' }))).toBe(false);
    expect(isSameOriginWrite(req('DELETE', { origin: 'https://127.0.0.1:3100' }))).toBe(false);
    expect(isSameOriginWrite(req('PUT', { origin: 'null' }))).toBe(false);
    expect(isSameOriginWrite(req('POST', { 'sec-fetch-site': 'same-site' }))).toBe(false);
  });
});

describe('calendar dates', () => {
  it('accepts real days and refuses impossible ones', () => {
    // Gregorian leap-year rule (common practice, no source): 2024 and 2000 are leap years, 1900 and 2025 are not
    for (const d of ['2024-02-29', '2000-02-29', '2026-12-31', '2026-01-01']) expect(isCalendarDate(d), d).toBe(true);
    for (const d of [
      '2025-02-29',
      '1900-02-29',
      '2026-02-30',
      '2026-04-31',
      '2026-99-99',
      '2026-00-10',
      '0000-00-00',
      '2026-1-1',
    ])
      expect(isCalendarDate(d), d).toBe(false);
  });
});
