// The authorization matrix's table: for every route × method (and every page) the answer each caller must get.
// Every route.ts under app/ and every page.tsx must have its rows here; tests/e2e/authorization-matrix.spec.ts
// walks the file system and fails on a file, method or page without one.
//
// Callers (the demo accounts of the README):
//   admin, office           desk roles of the demo company
//   foreman, tech           the North crew, whose job every [id] below belongs to
//   tech2                   a technician of the South crew (same company, another crew)
//   foreign                 office@second.test: an office user of another company
//   none                    signed out
//
// An expectation is an HTTP status, a list of statuses, or for pages `→/path` (where the visitor lands).
// Mutations carry a well-formed but invalid JSON body (PROBE), so a caller who may act gets the input
// refusal (400/409/422) and one who may not gets 401/403/404 — nothing in the shared demo changes.
// DELETEs run against a copy of the row made for the case (`clone`); the spec removes every copy it made.

export const CALLERS = ['admin', 'office', 'foreman', 'tech', 'tech2', 'foreign', 'none'] as const;
export type Caller = (typeof CALLERS)[number];
export type Expectation = number | readonly number[] | `→${string}`;
export type Expectations = Record<Caller, Expectation>;

/** Tables of the demo rows that a DELETE may copy and delete instead of the original. */
export type CloneTable =
  | 'access_points'
  | 'attachments'
  | 'checklist_templates'
  | 'crews'
  | 'customers'
  | 'jobs'
  | 'packers'
  | 'repairs'
  | 'resin_kits'
  | 'resin_systems'
  | 'segments'
  | 'sites';

export type Row = {
  expect: Expectations;
  /** A concrete URL (with query) instead of the pattern filled with demo ids. */
  url?: string;
  /** Body of a mutation; PROBE unless set. */
  body?: unknown;
  /** Copies the row named by `[id]` from this table first and sends the request for the copy. */
  clone?: CloneTable;
  /** Set for a route another engineer is adding: skipped, and said so, until its file exists. */
  pending?: string;
};

/** Well-formed JSON that no schema accepts (the schemas are strict, or lack their required keys). */
export const PROBE = { matrixProbe: 1 };

const all = (e: Expectation): Expectations => ({
  admin: e,
  office: e,
  foreman: e,
  tech: e,
  tech2: e,
  foreign: e,
  none: e,
});
/** Anyone signed in (each company sees its own); 401 signed out. */
const signedIn = (e: Expectation): Expectations => ({ ...all(e), none: 401 });
/** Admin and office; field roles refused by role, another company's office finds no such row. */
const desk = (e: Expectation): Expectations => ({
  admin: e,
  office: e,
  foreman: 403,
  tech: 403,
  tech2: 403,
  foreign: 404,
  none: 401,
});
/** A desk collection: another company's office acts on its own company. */
const deskCollection = (e: Expectation): Expectations => ({ ...desk(e), foreign: e });
/** Admin only: every other role refused by role (another company's office too). */
const admin = (e: Expectation): Expectations => ({
  admin: e,
  office: 403,
  foreman: 403,
  tech: 403,
  tech2: 403,
  foreign: 403,
  none: 401,
});
/** A row of the North crew's job: desk and the crew read it; another crew and another company find nothing. */
const crewRow = (e: Expectation): Expectations => ({
  admin: e,
  office: e,
  foreman: e,
  tech: e,
  tech2: 404,
  foreign: 404,
  none: 401,
});
/**
 * An install or its evidence: another crew of the same company is refused by role of crew (403 "belongs to
 * another crew", which the tablet shows), another company finds nothing.
 */
const crewInstall = (e: Expectation): Expectations => ({ ...crewRow(e), tech2: 403 });
/** A company setting (resin, packers, check-lists): every user of the company reads it. */
const companyRow = (e: Expectation): Expectations => ({ ...signedIn(e), foreign: 404 });

export const API: Record<string, Row> = {
  'PATCH /api/access-points/[id]': { expect: desk(400) },
  'DELETE /api/access-points/[id]': { expect: desk(200), clone: 'access_points' },

  'GET /api/attachments': { expect: crewInstall(200), url: '/api/attachments?installId={install}' },
  'POST /api/attachments': { expect: signedIn(400) },
  // The office always; the uploader (tech) only until sign-off — this install is approved, so a conflict (409);
  // anyone else of the crew may not.
  'DELETE /api/attachments/[id]': { expect: { ...crewInstall(200), foreman: 403, tech: 409 }, clone: 'attachments' },
  // Completing an already-checked upload changes nothing (200) for the office and the uploader.
  'POST /api/attachments/[id]/complete': { expect: { ...crewInstall(200), foreman: 403 } },

  // next-auth's own endpoints are public; sign-in is its own proof (session read, and a post without its CSRF token).
  'GET /api/auth/[...nextauth]': { expect: all(200), url: '/api/auth/session' },
  'POST /api/auth/[...nextauth]': { expect: all('→/api/auth/signin'), url: '/api/auth/callback/credentials' },

  'GET /api/checklist-templates': { expect: signedIn(200) },
  'POST /api/checklist-templates': { expect: admin(400) },
  'GET /api/checklist-templates/[id]': { expect: companyRow(200) },
  'PATCH /api/checklist-templates/[id]': { expect: admin(400) },
  'DELETE /api/checklist-templates/[id]': { expect: admin(200), clone: 'checklist_templates' },

  'GET /api/company': { expect: signedIn(200) },
  'PATCH /api/company': { expect: admin(400) },

  'GET /api/crews': { expect: signedIn(200) },
  'POST /api/crews': { expect: admin(400) },
  'GET /api/crews/[id]': { expect: crewRow(200) },
  'PATCH /api/crews/[id]': { expect: admin(400) },
  'DELETE /api/crews/[id]': { expect: admin(200), clone: 'crews' },
  'PUT /api/crews/[id]/members': { expect: admin(400) },

  'GET /api/customers': { expect: signedIn(200) },
  'POST /api/customers': { expect: deskCollection(400) },
  'GET /api/customers/[id]': { expect: crewRow(200) },
  'PATCH /api/customers/[id]': { expect: desk(400) },
  'DELETE /api/customers/[id]': { expect: desk(200), clone: 'customers' },

  'GET /api/health': { expect: all(200) },

  // The office's figures: another company's office reads its own company's (no row of ours is named).
  'GET /api/insights': { expect: deskCollection(200), url: '/api/insights?from=2026-01-05&to=2026-03-01' },
  // The caller's own profile (language setting): every signed-in user, each only their own row.
  'GET /api/profile': { expect: signedIn(200) },
  'PATCH /api/profile': { expect: signedIn(400) },

  'GET /api/installs': { expect: signedIn(200) },
  'POST /api/installs': { expect: signedIn(400) },
  'GET /api/installs/[id]': { expect: crewInstall(200) },
  'POST /api/installs/[id]/events': { expect: crewInstall(400) },
  'POST /api/installs/[id]/review': { expect: desk(400) },
  'POST /api/installs/[id]/redo': { expect: { ...admin(403), admin: 400, foreman: 400 } },

  'GET /api/invoices': { expect: deskCollection(200) },
  'POST /api/invoices': { expect: deskCollection(400) },
  'GET /api/invoices/[id]': { expect: desk(200) },
  'PATCH /api/invoices/[id]': { expect: desk(400) },
  'POST /api/invoices/[id]/status': { expect: desk(400) },

  'GET /api/jobs': { expect: signedIn(200) },
  'POST /api/jobs': { expect: deskCollection(400) },
  'GET /api/jobs/[id]': { expect: crewRow(200) },
  'PATCH /api/jobs/[id]': { expect: desk(400) },
  'DELETE /api/jobs/[id]': { expect: desk(200), clone: 'jobs' },
  'GET /api/jobs/[id]/report': { expect: desk(200) },
  'POST /api/jobs/[id]/report': { expect: desk(400) },
  'GET /api/jobs/[id]/report-sends': { expect: desk(200) },
  'DELETE /api/jobs/[id]/report-links': { expect: desk(200), clone: 'jobs' },
  'PUT /api/jobs/[id]/schedule': { expect: desk(400) },
  // The job is closed: taking it off the schedule is a conflict, so nothing changes for those allowed.
  'DELETE /api/jobs/[id]/schedule': { expect: desk(409) },

  'GET /api/packers': { expect: signedIn(200) },
  'POST /api/packers': { expect: admin(400) },
  'GET /api/packers/[id]': { expect: companyRow(200) },
  'PATCH /api/packers/[id]': { expect: admin(400) },
  'DELETE /api/packers/[id]': { expect: admin(200), clone: 'packers' },

  // The signature over the raw body is the only authentication; a session changes nothing.
  'POST /api/payments/webhook': { expect: all(400) },

  'GET /api/repairs': { expect: signedIn(200) },
  'POST /api/repairs': { expect: deskCollection(400) },
  'GET /api/repairs/[id]': { expect: crewRow(200) },
  'PATCH /api/repairs/[id]': { expect: desk(400) },
  'DELETE /api/repairs/[id]': { expect: desk(200), clone: 'repairs' },
  'GET /api/repairs/[id]/plan': { expect: crewRow(200) },

  'GET /api/resin-kits': { expect: signedIn(200) },
  'POST /api/resin-kits': { expect: admin(400) },
  'GET /api/resin-kits/[id]': { expect: companyRow(200) },
  'PATCH /api/resin-kits/[id]': { expect: admin(400) },
  'DELETE /api/resin-kits/[id]': { expect: admin(200), clone: 'resin_kits' },

  'GET /api/resin-systems': { expect: signedIn(200) },
  'POST /api/resin-systems': { expect: admin(400) },
  'GET /api/resin-systems/[id]': { expect: companyRow(200) },
  'PATCH /api/resin-systems/[id]': { expect: admin(400) },
  'DELETE /api/resin-systems/[id]': { expect: admin(200), clone: 'resin_systems' },

  'GET /api/schedule': { expect: signedIn(200) },
  // The live stream: every signed-in user, each of their own company (field users their crews' installs only);
  // `once` ends it after the first `ready`, so the matrix reads a whole answer.
  'GET /api/live': { expect: signedIn(200), url: '/api/live?once=1' },
  // The live board's data: the office and admins, and foremen for their crews; technicians are refused by role.
  'GET /api/live/board': { expect: { ...signedIn(200), tech: 403, tech2: 403 } },

  'GET /api/segments': { expect: signedIn(200) },
  'POST /api/segments': { expect: deskCollection(400) },
  'GET /api/segments/[id]': { expect: crewRow(200) },
  'PATCH /api/segments/[id]': { expect: desk(400) },
  'DELETE /api/segments/[id]': { expect: desk(200), clone: 'segments' },

  'GET /api/sites': { expect: signedIn(200) },
  'POST /api/sites': { expect: deskCollection(400) },
  'GET /api/sites/[id]': { expect: crewRow(200) },
  'PATCH /api/sites/[id]': { expect: desk(400) },
  'DELETE /api/sites/[id]': { expect: desk(200), clone: 'sites' },
  'GET /api/sites/[id]/access-points': { expect: crewRow(200) },
  'POST /api/sites/[id]/access-points': { expect: desk(400) },

  'GET /api/users': { expect: admin(200) },
  'POST /api/users': { expect: admin(400) },
  'GET /api/users/[id]': { expect: admin(200) },
  'PATCH /api/users/[id]': { expect: admin(400) },
  'POST /api/users/[id]/password': { expect: admin(400) },

  // The customer's report link: no account; a link that does not verify is refused the same way for everyone.
  'GET /r/[token]/pdf': { expect: all(404) },
  'POST /r/[token]/pay': { expect: all(404) },
  // The service worker script is public (the sign-in page is precached by it).
  'GET /serwist/[path]': { expect: all(200), url: '/serwist/sw.js' },
};

const SIGN_IN = '→/sign-in';
const FORBIDDEN = '→/forbidden';
const deskPage = (own: Expectation = 200): Expectations => ({
  admin: 200,
  office: 200,
  foreman: FORBIDDEN,
  tech: FORBIDDEN,
  tech2: FORBIDDEN,
  foreign: own,
  none: SIGN_IN,
});
const adminPage: Expectations = {
  admin: 200,
  office: FORBIDDEN,
  foreman: FORBIDDEN,
  tech: FORBIDDEN,
  tech2: FORBIDDEN,
  foreign: FORBIDDEN,
  none: SIGN_IN,
};
const fieldPage = (other: Expectation): Expectations => ({
  admin: FORBIDDEN,
  office: FORBIDDEN,
  foreman: 200,
  tech: 200,
  tech2: other,
  foreign: FORBIDDEN,
  none: SIGN_IN,
});

export const PAGES: Record<string, Row> = {
  '/': {
    expect: {
      admin: '→/admin',
      office: '→/jobs',
      foreman: '→/today',
      tech: '→/today',
      tech2: '→/today',
      foreign: '→/jobs',
      none: SIGN_IN,
    },
  },
  '/sign-in': { expect: all(200) },
  '/forbidden': { expect: all(200) },
  '/profile': { expect: { ...all(200), none: SIGN_IN } },
  '/r/[token]': { expect: all(404) },
  // The payment provider's way back: without our cookie for that link, a plain page that names nothing.
  '/r/back/[linkId]': { expect: all(200), url: '/r/back/00000000-0000-4000-8000-000000000000' },

  '/admin': { expect: adminPage },
  '/admin/company': { expect: adminPage },
  '/admin/checklists': { expect: adminPage },
  '/admin/checklists/new': { expect: adminPage },
  '/admin/checklists/[id]': { expect: adminPage },
  '/admin/crews': { expect: adminPage },
  '/admin/crews/new': { expect: adminPage },
  '/admin/crews/[id]': { expect: adminPage },
  '/admin/packers': { expect: adminPage },
  '/admin/packers/new': { expect: adminPage },
  '/admin/packers/[id]': { expect: adminPage },
  '/admin/resin-kits': { expect: adminPage },
  '/admin/resin-kits/new': { expect: adminPage },
  '/admin/resin-kits/[id]': { expect: adminPage },
  '/admin/resin-systems': { expect: adminPage },
  '/admin/resin-systems/new': { expect: adminPage },
  '/admin/resin-systems/[id]': { expect: adminPage },
  '/admin/users': { expect: adminPage },
  '/admin/users/new': { expect: adminPage },
  '/admin/users/[id]': { expect: adminPage },

  '/customers': { expect: deskPage() },
  '/customers/new': { expect: deskPage() },
  '/customers/[id]': { expect: deskPage(404) },
  '/insights': { expect: deskPage() },
  '/invoices': { expect: deskPage() },
  '/jobs': { expect: deskPage() },
  '/jobs/new': { expect: deskPage() },
  '/jobs/[id]': { expect: deskPage(404) },
  '/repairs': { expect: deskPage() },
  // The new-repair and new-segment forms open on a job or site of the caller's company only.
  '/repairs/new': { expect: deskPage(404), url: '/repairs/new?jobId={job}' },
  '/repairs/[id]': { expect: deskPage(404) },
  '/reviews': { expect: deskPage() },
  '/reviews/[installId]': { expect: deskPage(404) },
  '/schedule': { expect: deskPage() },
  // The live board: desk roles and foremen (their crews' installs); technicians get the 403 page.
  '/live': { expect: { ...deskPage(), foreman: 200 } },
  '/segments/new': { expect: deskPage(404), url: '/segments/new?siteId={site}' },
  '/segments/[id]': { expect: deskPage(404) },
  '/sites': { expect: deskPage() },
  '/sites/new': { expect: deskPage() },
  '/sites/[id]': { expect: deskPage(404) },

  '/today': { expect: fieldPage(200) },
  // Another crew's install: the same refusal as the API's 403, the forbidden page.
  '/installs/[id]': { expect: fieldPage(FORBIDDEN) },
};
