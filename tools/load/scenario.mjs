// The virtual clients of the load test: an engineer each, who signs in, searches the catalog,
// runs selections and saves a design of their own with its version; from time to time all of
// them save one shared design at the same moment.
import { performance } from 'node:perf_hooks';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, tagOfInput, taggedInput } from '../harness/fixtures.mjs';

export const ENGINEER = DEMO_ACCOUNTS.engineer;

const MOUNT_TYPES = ['elastomer_pad', 'elastomer_mount', 'open_spring', 'housed_spring', 'restrained_spring'];

/**
 * When client `index` (0 … clients − 1) starts, in ms after the first: evenly over the ramp,
 * the first at 0 and the last one step before its end.
 * @param {number} index
 * @param {number} clients
 * @param {number} rampMs
 */
export const rampStart = (index, clients, rampMs) => (index * rampMs) / clients;

const pick = (list) => list[Math.floor(Math.random() * list.length)];
const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Rounds in which every client saves the shared design at once: a round is announced every
 * `everyMs`; each client joins on its next turn, reads the design, waits at the barrier until
 * all have read it (at most `maxWaitMs`), then saves on the version it read.
 */
export class RaceRounds {
  constructor(participants, everyMs, maxWaitMs = 1500) {
    this.participants = participants;
    this.everyMs = everyMs;
    this.maxWaitMs = maxWaitMs;
    this.round = 0;
    this.barriers = new Map();
    this.delay = undefined;
    this.timer = undefined;
  }

  /** Announces a round every `everyMs`, the first `afterMs + everyMs` from now (after the ramp). */
  start(afterMs = 0) {
    this.delay = setTimeout(() => {
      this.timer = setInterval(() => {
        this.round++;
        let release;
        const released = new Promise((resolve) => (release = resolve));
        this.barriers.set(this.round, { arrived: 0, release, released });
      }, this.everyMs);
    }, afterMs);
  }

  stop() {
    clearTimeout(this.delay);
    clearInterval(this.timer);
    for (const barrier of this.barriers.values()) barrier.release();
  }

  /** The round a client that last joined `joined` should join now, or 0. */
  pending(joined) {
    return this.round > joined ? this.round : 0;
  }

  async arrive(round) {
    const barrier = this.barriers.get(round);
    barrier.arrived++;
    if (barrier.arrived >= this.participants) barrier.release();
    await Promise.race([barrier.released, sleep(this.maxWaitMs)]);
  }
}

/** Sign-ins at a steady, modest rate: one turn every `everyMs`, taken by whichever client asks first. */
export class SignInSchedule {
  constructor(everyMs, startedAt) {
    this.everyMs = everyMs;
    this.startedAt = startedAt;
    this.taken = 0;
  }

  take() {
    if (!(this.everyMs > 0)) return false;
    const due = Math.floor((performance.now() - this.startedAt) / this.everyMs);
    if (this.taken >= due) return false;
    this.taken++;
    return true;
  }
}

/**
 * Runs one virtual client from `startAt` until `ctx.deadline` (performance.now() ms).
 * ctx: { http, recorder, problem(kind, message), deadline, token, signIns, thinkMs, races, supplierIds,
 *        sharedDesignId, sharedAttempts[], nextTag(), answered() — called once, when the first answer arrives }
 * own: { client, designId, acknowledged: { version, name, tag } } — updated in place.
 */
export async function runVirtualClient(ctx, own, startAt = 0) {
  let answered = false;
  const call = async (kind, method, path, { token, body, expect }) => {
    const sent = performance.now();
    try {
      const reply = await ctx.http.request(method, path, { token, body });
      ctx.recorder.record(kind, reply.ms, reply.status, reply);
      if (!expect.includes(reply.status)) {
        ctx.problem(kind, `${method} ${path} answered ${reply.status}: ${JSON.stringify(reply.body).slice(0, 300)}`);
      }
      return reply;
    } catch (error) {
      ctx.recorder.record(kind, null, 'transport error', { at: sent });
      ctx.problem(kind, `${method} ${path}: ${error instanceof Error ? error.message : String(error)}`);
      return null;
    } finally {
      if (!answered) {
        answered = true;
        ctx.answered();
      }
    }
  };

  const signIn = async () => {
    const reply = await call('sign-in', 'POST', '/api/auth/login', {
      body: { email: ENGINEER, password: DEMO_PASSWORD },
      expect: [200],
    });
    return reply?.status === 200 ? reply.body.accessToken : null;
  };

  // Every client starts with the token of the set-up sign-in (same account; a sign-in costs a
  // deliberately slow bcrypt comparison, so 50 at once would measure nothing else) and signs
  // in again when the sign-in schedule hands it a turn.
  let token = ctx.token;
  let joined = 0;
  // The ramp: each client starts at its own moment, so connections open one after another as
  // people arrive, not all in the same instant (see tools/load/run.mjs).
  await sleep(startAt - performance.now());

  while (performance.now() < ctx.deadline) {
    if (ctx.signIns.take()) {
      token = (await signIn()) ?? token;
      continue;
    }
    const round = ctx.races.pending(joined);
    if (round) {
      joined = round;
      const read = await call('shared read', 'GET', `/api/designs/${ctx.sharedDesignId}`, { token, expect: [200] });
      if (read?.status !== 200) continue;
      await ctx.races.arrive(round);
      const tag = ctx.nextTag();
      const baseVersion = read.body.version;
      const save = await call('shared save', 'PUT', `/api/designs/${ctx.sharedDesignId}`, {
        token,
        body: { version: baseVersion, name: `Shared load design save ${tag}`, input: taggedInput(tag) },
        expect: [200, 409],
      });
      ctx.sharedAttempts.push({ baseVersion, status: save?.status ?? 'transport error', version: save?.body?.version, tag });
      continue;
    }

    const r = Math.random();
    if (r < 0.45) {
      // Catalog search with the filters of the catalog page.
      const type = pick(MOUNT_TYPES);
      const minLoadN = Math.round(200 + Math.random() * 8000);
      const query = new URLSearchParams({
        type,
        minLoadN: String(minLoadN),
        maxLoadN: String(minLoadN * (1.5 + Math.random() * 3)),
        sort: pick(['ratedLoadN', '-ratedLoadN', 'unitPrice']),
        page: String(1 + Math.floor(Math.random() * 2)),
        pageSize: pick(['20', '50']),
      });
      if (Math.random() < 0.3) query.set('supplierId', String(pick(ctx.supplierIds)));
      if (Math.random() < 0.2) query.set('q', pick(['S1', 'E2', 'P1', 'H1']));
      await call('catalog search', 'GET', `/api/mounts?${query}`, { token, expect: [200] });
    } else if (r < 0.6) {
      // A stateless selection over the whole catalog for a machine of random mass.
      const mass = 600 + Math.random() * 2400;
      await call('selection', 'POST', '/api/selection', {
        token,
        body: {
          components: [{ name: 'Machine', massKg: mass, cg: { x: 0, y: 0, z: 0.4 } }],
          mountPoints: taggedInput(0).mountPoints,
          disturbingFrequenciesHz: [24.67, 49.33, 100],
          criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 },
          limit: 10,
        },
        expect: [200],
      });
    } else if (r < 0.92) {
      // Save the client's own design on the version it holds: nobody else writes it, so 200.
      const tag = ctx.nextTag();
      const name = `Load client ${own.client} save ${tag}`;
      const base = own.acknowledged.version;
      const save = await call('design save', 'PUT', `/api/designs/${own.designId}`, {
        token,
        body: { version: base, name, input: taggedInput(tag) },
        expect: [200],
      });
      if (save?.status === 200) {
        if (save.body.version !== base + 1) ctx.problem('design save', `client ${own.client}: version ${base} became ${save.body.version}`);
        own.acknowledged = { version: save.body.version, name, tag };
      } else if (save?.status === 409) {
        const fresh = await call('design read', 'GET', `/api/designs/${own.designId}`, { token, expect: [200] });
        if (fresh?.status === 200)
          own.acknowledged = { version: fresh.body.version, name: fresh.body.name, tag: tagOfInput(fresh.body.input) };
      }
    } else {
      await call('design read', 'GET', `/api/designs/${own.designId}`, { token, expect: [200] });
    }
    if (ctx.thinkMs) await sleep(Math.random() * 2 * ctx.thinkMs);
  }
}
