import { describe, expect, it } from 'vitest';
import { listGuides } from '@/lib/guides/content';
import { GUIDES, WARNING_INFO } from '@/lib/hydraulics/warnings';

describe('the guides a warning points to', () => {
  const onDisk = listGuides().map((g) => g.slug);

  it('are the guides on disk, every one of them', () => {
    // a warning's "read more" link to a guide that is not there is a dead end for the reader
    expect([...GUIDES].sort()).toEqual([...onDisk].sort());
  });

  it('exist for every warning code', () => {
    for (const [code, info] of Object.entries(WARNING_INFO)) expect(onDisk, code).toContain(info.guide);
  });
});
