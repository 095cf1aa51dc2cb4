import { NextResponse } from 'next/server';
import { z } from 'zod';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { importModeSchema } from '@/lib/validation/field-log';
import { importCsv } from '@/lib/field-log/csv';
import { indexFieldLog } from '@/lib/search';

export const dynamic = 'force-dynamic';

const importSchema = z.object({
  csv: z
    .string({ error: 'csv is required: the text of the file' })
    .min(1, 'csv: the file is empty')
    .max(1_000_000, 'csv: at most 1 MB at a time'),
  mode: importModeSchema,
});

/**
 * POST /api/field-log/import — { csv, mode }. All-or-nothing by default: any bad row
 * answers 422 with every row's error and writes nothing; mode "valid-only" writes the
 * good rows and lists the skipped ones.
 */
export async function POST(request: Request) {
  return guarded(
    request,
    'fieldLog.import',
    async (user) => {
      const body = await readJson(request, importSchema);
      if ('response' in body) return body.response;
      const result = await importCsv(user, body.data.csv, body.data.mode);
      await indexFieldLog(result.ids);
      if (body.data.mode === 'all-or-nothing' && result.errors.length) {
        return NextResponse.json(
          {
            error: {
              field: 'csv',
              message: `${result.errors.length} of the rows have errors; nothing was imported. Fix them, or import the valid rows only.`,
              code: 'invalid_rows',
            },
            ...result,
          },
          { status: 422 },
        );
      }
      return NextResponse.json(result, { status: 201 });
    },
    { flood: 'post' },
  );
}
