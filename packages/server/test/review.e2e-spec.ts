import { DEMO_PROJECT } from '../src/designs/demo-designs.seed.js';
import { MailCatcherService } from '../src/mail/mail-catcher.service.js';
import { createDesign, createRfqCatalog, releaseDesign, type TestCatalog } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

describe('review workflow (e2e)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  let catalog: TestCatalog;
  const ids: Record<string, number> = {};

  const transition = (id: number, who: string, body: object) => t.http().post(`/api/designs/${id}/transitions`).set(as(who)).send(body);
  const get = (id: number, who = 'engineer') => t.http().get(`/api/designs/${id}`).set(as(who));
  const history = (id: number, who = 'engineer') => t.http().get(`/api/designs/${id}/history`).set(as(who));
  const mailsAbout = (text: string) =>
    t.app
      .get(MailCatcherService)
      .store.list()
      .filter((mail) => mail.subject.includes(text));

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['admin', 'engineer', 'purchaser', 'viewer', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    for (const who of ['engineer', 'checker', 'admin', 'purchaser']) {
      const me = await t.http().get('/api/auth/me').set(as(who));
      ids[who] = me.body.id;
    }
    catalog = await createRfqCatalog(t, tokens.catalog_manager, 'quotes@review-test.invalid');
  });
  afterAll(() => t.close());

  it('draft → in_review needs chosen mounts (409) and the author or an admin (403 for another engineer)', async () => {
    const bare = await createDesign(t, tokens.engineer, catalog, false);
    const noMounts = await transition(bare.id, 'engineer', { to: 'in_review' });
    expect(noMounts.status).toBe(409);
    expect(noMounts.body.message).toBe('Choose mounts before sending the design for check');

    const design = await createDesign(t, tokens.engineer, catalog);
    expect((await transition(design.id, 'checker', { to: 'in_review' })).status).toBe(403);
    expect((await transition(design.id, 'viewer', { to: 'in_review' })).status).toBe(403);
    expect((await transition(design.id, 'purchaser', { to: 'in_review' })).status).toBe(403);
    const submitted = await transition(design.id, 'engineer', { to: 'in_review' });
    expect(submitted.status).toBe(200);
    expect(submitted.body.status).toBe('in_review');

    const byAdmin = await createDesign(t, tokens.engineer, catalog);
    expect((await transition(byAdmin.id, 'admin', { to: 'in_review' })).status).toBe(200);
  });

  it('the author cannot release; another engineer can and becomes the checker; the design is then frozen', async () => {
    const design = await createDesign(t, tokens.engineer, catalog);
    await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
    const own = await transition(design.id, 'engineer', { to: 'released' });
    expect(own.status).toBe(403);
    expect(own.body.message).toBe('A design is released by an engineer other than its author');

    const released = await transition(design.id, 'checker', { to: 'released' });
    expect(released.status).toBe(200);
    expect(released.body.status).toBe('released');
    expect(released.body.checker).toEqual({ id: ids.checker, name: expect.any(String) });
    expect(released.body.bom.length).toBe(1);

    const put = await t
      .http()
      .put(`/api/designs/${design.id}`)
      .set(as('engineer'))
      .send({ version: released.body.version, name: 'Changed' });
    expect(put.status).toBe(409);
    expect(put.body.message).toBe('Released designs are frozen; start a new revision');
    const back = await transition(design.id, 'checker', { to: 'draft', comment: 'Reopen' });
    expect(back.status).toBe(409);
    expect(back.body.message).toBe('A design cannot go from released to draft');
  });

  it('an admin who is not the author releases; an admin who is the author cannot', async () => {
    const design = await createDesign(t, tokens.engineer, catalog);
    await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
    expect((await transition(design.id, 'admin', { to: 'released' })).status).toBe(200);

    const own = await createDesign(t, tokens.admin, catalog);
    await transition(own.id, 'admin', { to: 'in_review' }).expect(200);
    expect((await transition(own.id, 'admin', { to: 'released' })).status).toBe(403);
    expect((await transition(own.id, 'checker', { to: 'released' })).status).toBe(200);
  });

  it('back to draft needs a comment (400), is allowed to any engineer, and is recorded in the history', async () => {
    const design = await createDesign(t, tokens.engineer, catalog);
    await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
    expect((await transition(design.id, 'checker', { to: 'draft' })).status).toBe(400);
    expect((await transition(design.id, 'checker', { to: 'draft', comment: '   ' })).status).toBe(400);
    const back = await transition(design.id, 'checker', { to: 'draft', comment: 'Point C is over 95 % utilisation' });
    expect(back.status).toBe(200);
    expect(back.body.status).toBe('draft');

    const response = await history(design.id);
    expect(response.status).toBe(200);
    expect(response.body.map((e: { from: string; to: string }) => [e.from, e.to])).toEqual([
      ['draft', 'in_review'],
      ['in_review', 'draft'],
    ]);
    expect(response.body[0].user).toEqual({ id: ids.engineer, name: expect.any(String) });
    expect(response.body[1]).toMatchObject({ user: { id: ids.checker }, comment: 'Point C is over 95 % utilisation' });
    expect(Date.parse(response.body[0].at)).toBeLessThanOrEqual(Date.parse(response.body[1].at));
    // a viewer reads the history too
    expect((await history(design.id, 'viewer')).status).toBe(200);
  });

  it('refuses every other move with 409 and the from/to wording; an unknown target is 400', async () => {
    const design = await createDesign(t, tokens.engineer, catalog);
    const skip = await transition(design.id, 'checker', { to: 'released' });
    expect(skip.status).toBe(409);
    expect(skip.body.message).toBe('A design cannot go from draft to released');
    expect((await transition(design.id, 'engineer', { to: 'draft', comment: 'x' })).status).toBe(409);
    expect((await transition(design.id, 'engineer', { to: 'superseded' })).status).toBe(400);
  });

  it('notifies the other engineers when a design is sent for check and the purchasers when it is released', async () => {
    const design = await createDesign(t, tokens.engineer, catalog);
    await releaseDesign(t, design.id, tokens.engineer, tokens.checker);

    const ready = mailsAbout(`Please check: ${design.name} rev 1 (${design.projectName})`);
    const readyTo = ready.map((mail) => mail.to);
    expect(readyTo).toContain('checker@tacet.test');
    expect(readyTo).not.toContain('engineer@tacet.test');
    expect(readyTo).not.toContain('buyer@tacet.test');

    const released = mailsAbout(`Released: ${design.name} rev 1 (${design.projectName})`);
    expect(released.map((mail) => mail.to).sort()).toEqual(['buyer@tacet.test', 'engineer@tacet.test']);

    // the same through the admin outbox
    const outbox = await t.http().get('/api/outbox').set(as('admin'));
    expect(outbox.body.some((m: { subject: string }) => m.subject === `Released: ${design.name} rev 1 (${design.projectName})`)).toBe(true);
  });

  it('a new revision is a draft rev n+1 with the same input and mounts; releasing it supersedes the older one', async () => {
    const design = await createDesign(t, tokens.engineer, catalog);
    expect((await t.http().post(`/api/designs/${design.id}/revisions`).set(as('engineer'))).status).toBe(409);
    await releaseDesign(t, design.id, tokens.engineer, tokens.checker);
    expect((await t.http().post(`/api/designs/${design.id}/revisions`).set(as('purchaser'))).status).toBe(403);

    const revision = await t.http().post(`/api/designs/${design.id}/revisions`).set(as('checker'));
    expect(revision.status).toBe(201);
    const rev1 = (await get(design.id)).body;
    expect(revision.body).toMatchObject({ name: design.name, revision: 2, status: 'draft', checker: null, author: { id: ids.checker } });
    expect(revision.body.input).toEqual(rev1.input);
    expect(revision.body.chosen).toEqual(rev1.chosen);
    expect(revision.body.bom).toEqual(rev1.bom);

    const revHistory = await history(revision.body.id);
    expect(revHistory.body).toEqual([expect.objectContaining({ from: null, to: 'draft', comment: 'Revision 2 started from revision 1' })]);

    // rev 2 is editable, rev 1 is still released until rev 2 is
    await t
      .http()
      .put(`/api/designs/${revision.body.id}`)
      .set(as('checker'))
      .send({ version: revision.body.version, name: design.name })
      .expect(200);
    expect((await get(design.id)).body.status).toBe('released');
    await releaseDesign(t, revision.body.id, tokens.checker, tokens.engineer);
    expect((await get(revision.body.id)).body.status).toBe('released');
    const older = await get(design.id);
    expect(older.body.status).toBe('superseded');
    const olderHistory = await history(design.id);
    expect(olderHistory.body.at(-1)).toMatchObject({ from: 'released', to: 'superseded', comment: 'Superseded by revision 2' });

    // a third revision from the superseded one still counts on from the highest
    const rev3 = await t.http().post(`/api/designs/${design.id}/revisions`).set(as('engineer'));
    expect(rev3.status).toBe(201);
    expect(rev3.body.revision).toBe(3);

    // purchasers see released and superseded revisions only
    expect((await get(rev3.body.id, 'purchaser')).status).toBe(404);
    expect((await history(design.id, 'purchaser')).status).toBe(200);
  });

  it('the demo release has its review trail and is exportable by the purchaser', async () => {
    const projects = await t.http().get('/api/projects').set(as('purchaser'));
    const list = Array.isArray(projects.body) ? projects.body : projects.body.items;
    const demo = list.find((p: { name: string }) => p.name === DEMO_PROJECT.name);
    const designs = await t.http().get(`/api/projects/${demo.id}/designs`).set(as('purchaser'));
    const releasedDemo = designs.body.find((d: { status: string }) => d.status === 'released');
    const trail = await history(releasedDemo.id, 'purchaser');
    expect(trail.body.map((e: { from: string; to: string; user: { id: number } }) => [e.from, e.to, e.user.id])).toEqual([
      ['draft', 'in_review', ids.engineer],
      ['in_review', 'released', ids.checker],
    ]);
    const design = (await get(releasedDemo.id, 'purchaser')).body;
    if (design.bom.length > 0) {
      expect((await t.http().get(`/api/designs/${releasedDemo.id}/bom.csv`).set(as('purchaser'))).status).toBe(200);
    }
  });
});
