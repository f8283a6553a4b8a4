import 'server-only';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { requireUser, type SessionUser } from '@/lib/auth/session';
import { csvResponse, toCsv, type CsvColumn } from '@/lib/server/csv';
import { ownRowId, type OwnRowKind } from '@/lib/data/access';
import type { Page } from '@/lib/data/list';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';

// The route handlers of a company settings resource (resin systems and kits, packers, check-lists):
// every signed-in user of the company reads (the crew's tablet needs them); only an admin writes,
// which lib/data checks again. Each handler still starts with who, may they, is the input well-formed.

type Context = { params: Promise<{ id: string }> };

/** GET (a page, or `?format=csv` every match) and POST (201 with the row) of a settings collection. */
export function settingsCollection<Q, I, Row>(options: {
  csvName: string;
  querySchema: z.ZodType<Q>;
  inputSchema: z.ZodType<I>;
  list: (user: SessionUser, query: Q, exportAll?: boolean) => Promise<Page<Row>>;
  create: (user: SessionUser, input: I) => Promise<unknown>;
  csv: CsvColumn<Row>[];
}) {
  return {
    GET: handle(async (request: Request) => {
      const user = await requireUser();
      const query = parseOrThrow(options.querySchema, searchParamsOf(request));
      if (!wantsCsv(request)) return NextResponse.json(await options.list(user, query));
      const { items } = await options.list(user, query, true);
      return csvResponse(options.csvName, toCsv(items, options.csv));
    }),
    POST: handle(async (request: Request) => {
      const user = await requireUser(ADMIN_ONLY);
      const input = parseOrThrow(options.inputSchema, await bodyOf(request));
      return NextResponse.json(await options.create(user, input), { status: 201 });
    }),
  };
}

/** GET, PATCH (partial, strict) and DELETE (archive when in use, delete otherwise) of one settings record. */
export function settingsRecord<P>(options: {
  what: string;
  /** The row kind `[id]` names: checked as the company's before the body is read. */
  kind: OwnRowKind;
  patchSchema: z.ZodType<P>;
  get: (user: SessionUser, id: string) => Promise<unknown>;
  update: (user: SessionUser, id: string, patch: P) => Promise<unknown>;
  archive: (user: SessionUser, id: string) => Promise<unknown>;
}) {
  return {
    GET: handle(async (_request: Request, { params }: Context) => {
      const user = await requireUser();
      return NextResponse.json(await options.get(user, await idOf(params, options.what)));
    }),
    PATCH: handle(async (request: Request, { params }: Context) => {
      const user = await requireUser(ADMIN_ONLY);
      const id = await ownRowId(user, options.kind, params, options.what);
      const patch = parseOrThrow(options.patchSchema, await bodyOf(request));
      return NextResponse.json(await options.update(user, id, patch));
    }),
    DELETE: handle(async (_request: Request, { params }: Context) => {
      const user = await requireUser(ADMIN_ONLY);
      return NextResponse.json(await options.archive(user, await idOf(params, options.what)));
    }),
  };
}
