import 'server-only';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { requireUser, type SessionUser } from '@/lib/auth/session';
import { csvResponse, toCsv, type CsvColumn } from '@/lib/server/csv';
import { ownRowId, type OwnRowKind } from '@/lib/data/access';
import type { Page } from '@/lib/data/list';
import type { Role } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';

// The route handlers of every desk record (office records and company settings alike): one pattern, so a list,
// a create, a read, a partial update and an archive answer the same statuses everywhere (DEVELOPERS.md, "Desk
// mode"). Each handler still starts with who is asking (`readers` / `writers`: the roles; no `readers` means
// every signed-in user, whom lib/data scopes to their company and crews), then the row `[id]` names, then the
// input; lib/data checks role and company again.

type Context = { params: Promise<{ id: string }> };
type Handler<A extends unknown[]> = (...args: A) => Promise<Response>;

/** GET (a page, or `?format=csv` every match) and POST (201 with the row) of a record collection. */
export function recordCollection<Q, I, Row>(options: {
  csvName: string;
  querySchema: z.ZodType<Q>;
  inputSchema: z.ZodType<I>;
  list: (user: SessionUser, query: Q, exportAll?: boolean) => Promise<Page<Row>>;
  create: (user: SessionUser, input: I) => Promise<unknown>;
  csv: CsvColumn<Row>[];
  readers?: readonly Role[];
  writers: readonly Role[];
}) {
  return {
    GET: handle(async (request: Request) => {
      const user = await requireUser(options.readers);
      const query = parseOrThrow(options.querySchema, searchParamsOf(request));
      if (!wantsCsv(request)) return NextResponse.json(await options.list(user, query));
      const { items } = await options.list(user, query, true);
      return csvResponse(options.csvName, toCsv(items, options.csv));
    }),
    POST: handle(async (request: Request) => {
      const user = await requireUser(options.writers);
      const input = parseOrThrow(options.inputSchema, await bodyOf(request));
      return NextResponse.json(await options.create(user, input), { status: 201 });
    }),
  };
}

type ItemOptions<P> = {
  /** The record's name in messages ("Packer not found"). */
  what: string;
  /** The row kind `[id]` names: checked as the company's before the body is read. */
  kind: OwnRowKind;
  patchSchema: z.ZodType<P>;
  get: (user: SessionUser, id: string) => Promise<unknown>;
  update: (user: SessionUser, id: string, patch: P) => Promise<unknown>;
  readers?: readonly Role[];
  writers: readonly Role[];
};
type Archive = (user: SessionUser, id: string) => Promise<unknown>;
type ItemHandler = Handler<[Request, Context]>;

/**
 * GET, PATCH (partial, strict) and — with `archive` — DELETE (archive when something depends on the record, delete
 * it otherwise) of one record.
 */
export function recordItem<P>(options: ItemOptions<P> & { archive: Archive }): {
  GET: ItemHandler;
  PATCH: ItemHandler;
  DELETE: ItemHandler;
};
export function recordItem<P>(options: ItemOptions<P>): { GET: ItemHandler; PATCH: ItemHandler };
export function recordItem<P>(options: ItemOptions<P> & { archive?: Archive }) {
  const routes = {
    GET: handle(async (_request: Request, { params }: Context) => {
      const user = await requireUser(options.readers);
      return NextResponse.json(await options.get(user, await idOf(params, options.what)));
    }),
    PATCH: handle(async (request: Request, { params }: Context) => {
      const user = await requireUser(options.writers);
      const id = await ownRowId(user, options.kind, params, options.what);
      const patch = parseOrThrow(options.patchSchema, await bodyOf(request));
      return NextResponse.json(await options.update(user, id, patch));
    }),
  };
  const { archive } = options;
  if (!archive) return routes;
  return {
    ...routes,
    DELETE: handle(async (_request: Request, { params }: Context) => {
      const user = await requireUser(options.writers);
      return NextResponse.json(await archive(user, await idOf(params, options.what)));
    }),
  };
}
