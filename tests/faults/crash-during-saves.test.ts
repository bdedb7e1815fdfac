import { afterAll, describe, expect, inject, it } from 'vitest';
import { Api, tagOfInput, taggedInput } from './support/api';
import { integrityOf, storedDesign } from './support/database';
import { cleanUp, copyOfTemplate, startServer } from './support/server';

/** Concurrent writers saving the same design. */
const WRITERS = 4;
/** Kill rounds on the same data folder, each at another random moment. */
const ROUNDS = 2;

interface Sent {
  /** The version the save was based on (the stored version becomes this + 1 if it wins). */
  baseVersion: number;
  tag: number;
}

const nameOf = (tag: number) => `Crash test save ${tag}`;
const tagOfName = (name: string) => Number(/save (\d+)$/.exec(name)?.[1] ?? NaN);

describe('kill -9 during design saves', () => {
  afterAll(cleanUp);

  it('keeps the design at exactly one version that was sent, never a mix, and every acknowledged save', async () => {
    const dataDir = copyOfTemplate(inject('templateDir'));
    let server = await startServer(dataDir);
    let engineer = await Api.signIn(server.baseURL, 'engineer@tacet.test');
    const project = await engineer.post('/api/projects', { name: 'Crash test project' });
    expect(project.status).toBe(201);
    const created = await engineer.post(`/api/projects/${project.body.id}/designs`, { name: nameOf(0), input: taggedInput(0) });
    expect(created.status).toBe(201);
    const id: number = created.body.id;

    let nextTag = 1;
    const sent: Sent[] = [{ baseVersion: 0, tag: 0 }]; // the design as created: version 1, tag 0
    let acknowledged = { version: 1, tag: 0 };

    for (let round = 1; round <= ROUNDS; round++) {
      let running = true;
      const writer = async () => {
        let version = (await engineer.get(`/api/designs/${id}`)).body.version as number;
        while (running) {
          const tag = nextTag++;
          sent.push({ baseVersion: version, tag });
          let reply;
          try {
            reply = await engineer.put(`/api/designs/${id}`, { version, name: nameOf(tag), input: taggedInput(tag) });
          } catch {
            return; // the server is gone
          }
          if (reply.status === 200) {
            version = reply.body.version;
            if (version > acknowledged.version) acknowledged = { version, tag };
          } else if (reply.status === 409) {
            version = (await engineer.get(`/api/designs/${id}`).catch(() => ({ body: { version } }))).body.version;
          } else {
            throw new Error(`a save answered ${reply.status}: ${reply.text}`);
          }
        }
      };
      const writers = Array.from({ length: WRITERS }, writer);
      const delay = 300 + Math.floor(Math.random() * 1200);
      await new Promise((resolve) => setTimeout(resolve, delay));
      const exit = await server.kill();
      running = false;
      await Promise.all(writers);
      expect(exit.signal).toBe('SIGKILL');
      console.log(
        `round ${round}: killed after ${delay} ms; ${sent.length} saves sent so far, last acknowledged version ${acknowledged.version}`,
      );

      server = await startServer(dataDir);
      engineer = engineer.on(server.baseURL);
      const stored = storedDesign(dataDir, id);
      const served = (await engineer.get(`/api/designs/${id}`)).body;
      expect({ version: served.version, name: served.name, input: served.input }).toEqual(stored);

      // Name and input come from the same save…
      const tag = tagOfName(stored.name);
      expect(tagOfInput(stored.input)).toBe(tag);
      // …one that was sent, based on the version just below the stored one (or the original).
      expect(sent).toContainEqual({ baseVersion: stored.version - 1, tag });
      // Every acknowledged save survived: nothing older than the last acknowledgement is stored.
      expect(stored.version).toBeGreaterThanOrEqual(acknowledged.version);
      if (stored.version === acknowledged.version) expect(tag).toBe(acknowledged.tag);
      acknowledged = { version: stored.version, tag };

      // The design takes the next save as usual.
      const next = nextTag++;
      const save = await engineer.put(`/api/designs/${id}`, { version: stored.version, name: nameOf(next), input: taggedInput(next) });
      expect(save.status).toBe(200);
      expect(save.body.version).toBe(stored.version + 1);
      sent.push({ baseVersion: stored.version, tag: next });
      acknowledged = { version: save.body.version, tag: next };
    }

    await server.stop();
    expect(integrityOf(dataDir)).toBe('ok');
  });
});
