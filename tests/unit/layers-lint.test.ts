import path from 'node:path';
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

/*
 * The layer rules in eslint.config.mjs, run through ESLint's Node API on small snippets
 * placed (in memory) at the paths they guard: each forbidden import must be reported by
 * no-restricted-imports, and the allowed neighbours must not.
 */
const eslint = new ESLint({ cwd: path.resolve(__dirname, '../..') });

async function restrictedImports(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result.messages.filter((m) => m.ruleId === 'no-restricted-imports').map((m) => m.message);
}

const forbidden: [string, string][] = [
  ['lib/questions/example.ts', "import { Thread } from '@/components/questions/Thread';"],
  ['lib/questions/example.ts', "import Page from '@/app/questions/page';"],
  ['lib/questions/example.ts', "import { Thread } from '../../components/questions/Thread';"],
  ['lib/example.ts', "export { Thread } from '../components/questions/Thread';"],
  ['lib/hydraulics/example.ts', "import { getSequelize } from '@/lib/db';"],
  ['lib/hydraulics/example.ts', "import { useState } from 'react';"],
  ['lib/hydraulics/example.ts', "import { NextResponse } from 'next/server';"],
  ['lib/hydraulics/example.ts', "import { preference } from '../units/preference';"],
  ['lib/hydraulics/example.ts', "import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';"],
  ['lib/validation/example.ts', "import { ROLES } from '@/models/User';"],
  ['lib/validation/example.ts', "import type { Flag } from '../../models/Flag';"],
  ['lib/validation/example.ts', "import { Thread } from '@/components/questions/Thread';"],
  ['models/Example.ts', "import { Thread } from '@/components/questions/Thread';"],
  ['models/Example.ts', "import Page from '../app/questions/page';"],
];

const allowed: [string, string][] = [
  ['lib/questions/example.ts', "import { initModels } from '@/models';"],
  ['lib/questions/example.ts', "import { render } from '@react-email/components';"],
  ['lib/hydraulics/example.ts', "import * as z from 'zod/mini';"],
  ['lib/hydraulics/example.ts', "import { PUMP_TYPES } from '../vocabulary';"],
  ['lib/hydraulics/example.ts', "import { toSI } from './units';"],
  ['lib/validation/example.ts', "import { ROLES } from '@/lib/vocabulary';"],
  ['components/example.tsx', "import { ROLES } from '@/models/User';"],
  ['app/example/page.tsx', "import { Thread } from '@/components/questions/Thread';"],
];

describe('layer rules (eslint no-restricted-imports)', () => {
  it.each(forbidden)('%s: refuses %s', async (filePath, code) => {
    expect((await restrictedImports(filePath, `${code}\n`)).length).toBeGreaterThan(0);
  });

  it.each(allowed)('%s: allows %s', async (filePath, code) => {
    expect(await restrictedImports(filePath, `${code}\n`)).toEqual([]);
  });
});
