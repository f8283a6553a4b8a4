import { ESLint } from 'eslint';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// The layering rules of eslint.config.mjs, run through ESLint itself on probe sources placed (virtually) in
// the folders they govern: each rule must refuse what it is for and let the allowed case through.

const eslint = new ESLint({ cwd: path.resolve(import.meta.dirname, '../../..') });

async function problems(filePath: string, code: string) {
  const [result] = await eslint.lintText(code, { filePath });
  return result.messages.filter((m) => m.severity === 2).map((m) => m.ruleId);
}

describe('the layering held by ESLint', { timeout: 60_000 }, () => {
  it('keeps models behind lib/data and lib/auth', async () => {
    const code = "import { Job } from '@/models';\nexport const probe = Job;\n";
    expect(await problems('components/jobs/probe.tsx', code)).toContain('no-restricted-imports');
    expect(await problems('app/api/probe/route.ts', code)).toContain('no-restricted-imports');
    expect(await problems('lib/report/probe.ts', code)).toContain('no-restricted-imports');
    expect(await problems('lib/data/probe.ts', code)).toEqual([]);
    expect(await problems('lib/auth/probe.ts', code)).toEqual([]);
  });

  it('keeps the Sequelize instance out of routes and pages', async () => {
    const code = "import { sequelize } from '@/lib/data/db';\nexport const probe = sequelize;\n";
    expect(await problems('app/api/probe/route.ts', code)).toContain('no-restricted-imports');
    expect(await problems('lib/data/probe.ts', code)).toEqual([]);
  });

  it('never lets components/ import from app/', async () => {
    const code = "import type { Thing } from '@/app/api/things/route';\nexport type Probe = Thing;\n";
    expect(await problems('components/things/probe.tsx', code)).toContain('no-restricted-imports');
  });

  it("refuses server-only modules in a 'use client' file, listed or declaring themselves", async () => {
    const listed = "'use client';\nimport { listJobs } from '@/lib/data/jobs';\nexport const probe = listJobs;\n";
    expect(await problems('app/(desk)/jobs/probe.tsx', listed)).toContain('setline/no-server-import-in-client');
    // lib/report/images.ts is on no list: it starts with `import 'server-only'`.
    const declared =
      "'use client';\nimport { loadReportImages } from '@/lib/report/images';\nexport const probe = loadReportImages;\n";
    expect(await problems('components/report/probe.tsx', declared)).toContain('setline/no-server-import-in-client');
    const typeOnly =
      "'use client';\nimport type { JobListResponse } from '@/lib/data/jobs';\nexport type Probe = JobListResponse;\n";
    expect(await problems('app/(desk)/jobs/probe.tsx', typeOnly)).toEqual([]);
    const server = "import { listJobs } from '@/lib/data/jobs';\nexport const probe = listJobs;\n";
    expect(await problems('app/(desk)/jobs/probe.tsx', server)).toEqual([]);
  });

  it('reads the environment only through lib/env', async () => {
    const code = 'export const probe = process.env.SMTP_HOST;\n';
    expect(await problems('lib/report/probe.ts', code)).toContain('no-restricted-properties');
    expect(await problems('components/shell/probe.tsx', code)).toContain('no-restricted-properties');
    expect(await problems('scripts/probe.mjs', code)).toEqual([]);
  });
});
