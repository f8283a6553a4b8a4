import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/checklist-templates/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/checklist-templates/[id]/route';
import { AuditEntry, ChecklistTemplate, Install } from '@/models';
import { makeInstallWorld, makeWorld, type InstallWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

const items = [
  { label: 'Flow stopped upstream', required: true },
  { label: 'Gas test done', required: true },
  { label: 'Photo of the access point', required: false },
];

describe('check-list templates API', () => {
  let a: InstallWorld;
  let b: World;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeWorld('Beta');
    await ChecklistTemplate.bulkCreate(
      ['Winter', 'Lateral'].map((name) => ({
        companyId: a.company.id,
        name,
        items: [{ id: 'x', label: 'X', required: true }],
      })),
    );
  });
  beforeEach(() => signOut());
  const count = () => ChecklistTemplate.count({ where: { companyId: a.company.id } });

  it('lets every role read; pages and sorts', async () => {
    for (const user of [a.admin, a.office, a.foreman, a.technician]) {
      await signInAs(user);
      const page = await call(listRoute, '/api/checklist-templates?pageSize=2&sort=name');
      expect(page.status).toBe(200);
      expect(page.body).toMatchObject({ total: 3, pageCount: 2 });
      expect(page.body.items.map((t: { name: string }) => t.name)).toEqual(['Before the pull', 'Lateral']);
    }
    expect((await call(listRoute, '/api/checklist-templates?sort=-name&pageSize=1')).body.items[0].name).toBe('Winter');
    expect((await call(getRoute, '/x', { id: a.checklist.id })).body.items.map((i: { id: string }) => i.id)).toEqual([
      'flow',
      'clean',
    ]);
  });

  it('creates with ids for new items and an audit entry; empty or repeated labels are a 400 on the item, nothing written', async () => {
    await signInAs(a.admin);
    const before = await count();
    const bad = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', {
        name: 'Bad',
        items: [
          { label: 'Gas test', required: true },
          { label: ' ', required: true },
          { label: 'gas TEST ', required: false },
        ],
      }),
    );
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({
      'items.1.label': ['Say what the crew must check'],
      'items.2.label': ['Same as item 1'],
    });
    expect(
      (await call(createRoute, '/x', {}, jsonBody('POST', { name: 'Empty', items: [] }))).body.error.fields,
    ).toEqual({ items: ['Add at least one item'] });
    const badIds = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', {
        name: 'Ids',
        items: [
          { id: 'a', label: 'One', required: true },
          { id: 'a', label: 'Two', required: true },
          { id: 'no spaces', label: 'Three', required: true },
        ],
      }),
    );
    expect(Object.keys(badIds.body.error.fields).sort()).toEqual(['items.1.id', 'items.2.id']);
    expect(await count()).toBe(before);

    const made = await call(createRoute, '/x', {}, jsonBody('POST', { name: 'Standard', items }));
    expect(made.status).toBe(201);
    expect(made.body.active).toBe(true);
    expect(made.body.items.map((i: { label: string }) => i.label)).toEqual(items.map((i) => i.label));
    const ids = made.body.items.map((i: { id: string }) => i.id);
    expect(new Set(ids).size).toBe(3);
    ids.forEach((id: string) => expect(id).toMatch(/^item-[0-9a-f]{8}$/));
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'checklist_template',
      userId: a.admin.id,
    });
  });

  it('saves a reordered list with an item added and one removed, keeping the ids of the items that stay', async () => {
    await signInAs(a.admin);
    const made = (await call(createRoute, '/x', {}, jsonBody('POST', { name: 'Reorder me', items }))).body;
    const [flow, gas, photo] = made.items;
    const next = [gas, { label: 'Cones and signs set out', required: true }, flow];
    const saved = await call(patchRoute, '/x', { id: made.id }, jsonBody('PATCH', { items: next }));
    expect(saved.status).toBe(200);
    expect(saved.body.items.map((i: { label: string }) => i.label)).toEqual([
      'Gas test done',
      'Cones and signs set out',
      'Flow stopped upstream',
    ]);
    expect(saved.body.items[0].id).toBe(gas.id);
    expect(saved.body.items[2].id).toBe(flow.id);
    expect([gas.id, flow.id, photo.id]).not.toContain(saved.body.items[1].id);
    const audit = await AuditEntry.findOne({ where: { entityId: made.id, action: 'update' } });
    expect(Object.keys(audit?.changes ?? {})).toEqual(['items']);
    const dup = await call(
      patchRoute,
      '/x',
      { id: made.id },
      jsonBody('PATCH', { items: [gas, { ...flow, label: 'Gas test done' }] }),
    );
    expect(dup.status).toBe(400);
    expect((await ChecklistTemplate.findByPk(made.id))?.items).toHaveLength(3);
  });

  it('refuses writes by office and field roles with 403', async () => {
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/x', {}, jsonBody('POST', { name: 'No', items }))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.checklist.id }, jsonBody('PATCH', { name: 'No' }))).status).toBe(
        403,
      );
      expect((await call(archiveRoute, '/x', { id: a.checklist.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect((await ChecklistTemplate.findByPk(a.checklist.id))?.name).toBe('Before the pull');
  });

  it("answers 404 for another company's template", async () => {
    await signInAs(b.admin);
    expect((await call(getRoute, '/x', { id: a.checklist.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.checklist.id }, jsonBody('PATCH', { name: 'Mine' }))).status).toBe(
      404,
    );
    expect((await call(archiveRoute, '/x', { id: a.checklist.id }, { method: 'DELETE' })).status).toBe(404);
  });

  it('makes a template past installs used inactive, deletes an unused one', async () => {
    await Install.create({
      companyId: a.company.id,
      repairId: a.repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      checklistTemplateId: a.checklist.id,
    });
    await signInAs(a.admin);
    expect((await call(archiveRoute, '/x', { id: a.checklist.id }, { method: 'DELETE' })).body).toEqual({
      id: a.checklist.id,
      archived: true,
      deleted: false,
    });
    expect((await ChecklistTemplate.findByPk(a.checklist.id))?.active).toBe(false);
    expect(
      (await call(listRoute, '/api/checklist-templates?archived=only')).body.items.map((t: { id: string }) => t.id),
    ).toEqual([a.checklist.id]);
    expect(
      (await call(listRoute, '/api/checklist-templates?pageSize=100')).body.items.some(
        (t: { id: string }) => t.id === a.checklist.id,
      ),
    ).toBe(false);
    const winter = await ChecklistTemplate.findOne({ where: { companyId: a.company.id, name: 'Winter' } });
    expect((await call(archiveRoute, '/x', { id: winter!.id }, { method: 'DELETE' })).body.deleted).toBe(true);
    expect(await ChecklistTemplate.findByPk(winter!.id)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: winter!.id, action: 'delete' } })).toBe(1);
  });
});
