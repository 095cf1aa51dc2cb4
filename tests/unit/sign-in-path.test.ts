import { describe, expect, it } from 'vitest';
import { safeReturnPath, signInPath } from '@/lib/auth/return-path';

describe('signInPath: the sign-in link carries the way back to the page it was opened from', () => {
  it('a thread, a guide, a page with a query: back to it, encoded', () => {
    expect(signInPath('/questions/12')).toBe('/sign-in?callbackUrl=%2Fquestions%2F12');
    expect(signInPath('/guides/first-start')).toBe('/sign-in?callbackUrl=%2Fguides%2Ffirst-start');
    expect(signInPath('/questions?show=unanswered')).toBe('/sign-in?callbackUrl=%2Fquestions%3Fshow%3Dunanswered');
    // what the sign-in page then reads back is the same path
    const back = new URL(`https://x.invalid${signInPath('/questions/12')}`).searchParams.get('callbackUrl');
    expect(safeReturnPath(back)).toBe('/questions/12');
  });

  it('the home page and the account pages: a plain sign-in link', () => {
    expect(signInPath('/')).toBe('/sign-in');
    expect(signInPath(null)).toBe('/sign-in');
    expect(signInPath('/sign-in')).toBe('/sign-in');
    expect(signInPath('/sign-in?callbackUrl=%2Fquestions%2F1')).toBe('/sign-in');
    expect(signInPath('/reset-password/new')).toBe('/sign-in');
  });

  it('never another site', () => {
    expect(signInPath('//evil.example/x')).toBe('/sign-in');
    expect(signInPath('https://evil.example/questions/1')).toBe('/sign-in');
    expect(signInPath('/\\evil.example')).toBe('/sign-in');
  });
});
