// first, as in Next's own server: gives Next's request stores a real AsyncLocalStorage
import 'next/dist/server/node-environment-baseline';
import { describe, expect, it } from 'vitest';
import { workUnitAsyncStorage } from 'next/dist/server/app-render/work-unit-async-storage.external';
import { RequestCookies } from 'next/dist/server/web/spec-extension/cookies';
import { readReplicaConfig } from '@/lib/db/config';
import {
  hasPrimaryMarker,
  onPrimary,
  primaryMarkerCookie,
  primaryWanted,
  wantPrimaryWhen,
} from '@/lib/db/read-your-writes';
import { renderWantsPrimary } from '@/lib/http/read-your-writes';

type Store = Parameters<typeof workUnitAsyncStorage.run>[0];
const requestStore = (cookie: string) =>
  ({ type: 'request', cookies: new RequestCookies(new Headers({ cookie })) }) as unknown as Store;
const inStore = <T>(store: Store, fn: () => T) => workUnitAsyncStorage.run(store, fn);

describe('DB_REPLICAS', () => {
  it('lists host:port pairs, and nothing when unset', () => {
    expect(readReplicaConfig({})).toEqual([]);
    expect(readReplicaConfig({ DB_REPLICAS: ' ' })).toEqual([]);
    expect(readReplicaConfig({ DB_REPLICAS: '127.0.0.1:3421, db-2.internal:3306' })).toEqual([
      { host: '127.0.0.1', port: 3421 },
      { host: 'db-2.internal', port: 3306 },
    ]);
  });
  it('names the setting when a pair is malformed', () => {
    expect(() => readReplicaConfig({ DB_REPLICAS: '127.0.0.1' })).toThrow(/DB_REPLICAS must be host:port/);
    expect(() => readReplicaConfig({ DB_REPLICAS: '127.0.0.1:99999' })).toThrow(/DB_REPLICAS/);
  });
});

describe('read-your-writes marker', () => {
  it('is found among other cookies, and only under its own name', () => {
    expect(hasPrimaryMarker('cw_units=US; cw_rw=1')).toBe(true);
    expect(hasPrimaryMarker('cw_rwx=1; cw_units=US')).toBe(false);
    expect(hasPrimaryMarker(null)).toBe(false);
  });
  it('is short-lived and only for the server', () => {
    expect(primaryMarkerCookie(false)).toMatch(/^cw_rw=1; Max-Age=\d+; Path=\/; HttpOnly; SameSite=Lax$/);
    expect(primaryMarkerCookie(true)).toMatch(/; Secure$/);
  });
  it('onPrimary reaches queries however deeply they are awaited, and ends with its work', async () => {
    expect(primaryWanted()).toBe(false);
    const seen = await onPrimary(async () => {
      await new Promise((r) => setTimeout(r, 5));
      return Promise.all([1, 2].map(async () => primaryWanted()));
    });
    expect(seen).toEqual([true, true]);
    expect(primaryWanted()).toBe(false);
  });
});

describe('renders outside guarded()', () => {
  it('read the primary for a request with the marker and for renders Next keeps, a replica otherwise', () => {
    expect(renderWantsPrimary()).toBe(false);
    expect(inStore(requestStore('cw_units=US'), renderWantsPrimary)).toBe(false);
    expect(inStore(requestStore('cw_units=US; cw_rw=1'), renderWantsPrimary)).toBe(true);
    expect(inStore({ type: 'prerender-legacy' } as unknown as Store, renderWantsPrimary)).toBe(true);
  });
  it('the registered check decides for queries made outside onPrimary', () => {
    wantPrimaryWhen(renderWantsPrimary);
    try {
      expect(inStore(requestStore('cw_rw=1'), primaryWanted)).toBe(true);
      expect(inStore(requestStore(''), primaryWanted)).toBe(false);
    } finally {
      wantPrimaryWhen(() => false);
    }
  });
});
