#!/usr/bin/env node
// `npm run test:load`: a load test of the built server on loopback. It starts the server in
// demo mode on a free port with a throw-away data folder (tools/harness), runs virtual engineers for a while
// (sign-in, catalog search, selection, design saves with version checks, and rounds in which
// all of them save one shared design at once), prints requests/s and latency percentiles per
// kind of request, then checks against the database that every acknowledged save is stored.
// Exit 1 on any 5xx, transport error, unexpected status or broken invariant.
//
//   node tools/load/run.mjs [--duration 60] [--clients 50] [--race-every 5] [--sign-in-every 3] [--think 0]
//   (or TACET_LOAD_DURATION / TACET_LOAD_CLIENTS). Needs `npm run build` first.
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import Database from 'better-sqlite3';
import { DEMO_PASSWORD, tagOfInput, taggedInput } from '../harness/fixtures.mjs';
import { cleanUp, startServer, tempFolder } from '../harness/server.mjs';
import { createHttpClient } from './http-client.mjs';
import { checkOwnDesigns, checkSharedDesign } from './invariants.mjs';
import { ENGINEER, RaceRounds, SignInSchedule, runVirtualClient } from './scenario.mjs';
import { Recorder, formatSummary } from './stats.mjs';

function options(argv, env) {
  const value = (name, envName, fallback) => {
    const i = argv.indexOf(`--${name}`);
    const raw = i >= 0 ? argv[i + 1] : env[envName];
    const n = raw === undefined || raw === '' ? fallback : Number(raw);
    if (!Number.isFinite(n) || n < 0) throw new Error(`--${name} must be a number (got ${raw})`);
    return n;
  };
  return {
    durationS: value('duration', 'TACET_LOAD_DURATION', 60),
    clients: Math.max(1, Math.round(value('clients', 'TACET_LOAD_CLIENTS', 50))),
    raceEveryS: value('race-every', 'TACET_LOAD_RACE_EVERY', 5),
    signInEveryS: value('sign-in-every', 'TACET_LOAD_SIGN_IN_EVERY', 3),
    thinkMs: value('think', 'TACET_LOAD_THINK_MS', 0),
  };
}

/** The project, one design per client and the shared design, made before the clock starts. */
async function setUp(http, clients) {
  const login = await http.request('POST', '/api/auth/login', { body: { email: ENGINEER, password: DEMO_PASSWORD } });
  if (login.status !== 200) throw new Error(`set-up sign-in answered ${login.status}`);
  const token = login.body.accessToken;
  const ensure = (reply, what) => {
    if (reply.status !== 201 && reply.status !== 200) throw new Error(`${what} answered ${reply.status}: ${JSON.stringify(reply.body)}`);
    return reply.body;
  };
  const project = ensure(await http.request('POST', '/api/projects', { token, body: { name: 'Load test' } }), 'creating the project');
  const makeDesign = async (name, tag) =>
    ensure(
      await http.request('POST', `/api/projects/${project.id}/designs`, { token, body: { name, input: taggedInput(tag) } }),
      `creating ${name}`,
    );
  const own = [];
  for (let client = 0; client < clients; client++) {
    const name = `Load client ${client}`;
    const design = await makeDesign(name, 0);
    own.push({ client, designId: design.id, acknowledged: { version: design.version, name, tag: 0 } });
  }
  const shared = await makeDesign('Shared load design', 0);
  const suppliers = ensure(await http.request('GET', '/api/suppliers', { token }), 'listing suppliers');
  return {
    token,
    own,
    shared: { id: shared.id, initial: { version: shared.version, name: shared.name, tag: 0 } },
    supplierIds: suppliers.map((s) => s.id),
  };
}

function storedDesigns(dataDir, ids) {
  const db = new Database(join(dataDir, 'tacet.sqlite'), { readonly: true, fileMustExist: true });
  try {
    const integrity = db.pragma('integrity_check', { simple: true });
    const select = db.prepare('SELECT version, name, input FROM design WHERE id = ?');
    const designs = new Map();
    for (const id of ids) {
      const row = select.get(id);
      if (row) designs.set(id, { version: row.version, name: row.name, tag: tagOfInput(JSON.parse(row.input)) });
    }
    return { integrity, designs };
  } finally {
    db.close();
  }
}

async function main() {
  const opts = options(process.argv.slice(2), process.env);
  // The login limit is per client address (all clients are 127.0.0.1 here): the scheduled
  // sign-ins of one minute, the set-up sign-in and a margin.
  const loginLimit = (opts.signInEveryS > 0 ? Math.ceil(60 / opts.signInEveryS) : 0) + 10;
  console.log(
    `Load test: ${opts.clients} clients for ${opts.durationS} s, shared-design race every ${opts.raceEveryS} s, ` +
      `a sign-in every ${opts.signInEveryS} s (limit ${loginLimit}/min), think time ${opts.thinkMs} ms; ` +
      `${cpus().length} CPUs, load average ${loadavg()[0].toFixed(2)}`,
  );
  // Our own data folder: the database is read after the server has stopped.
  const dataDir = tempFolder('tacet-load-');
  let server;
  let http;
  try {
    server = await startServer({ dataDir, env: { TACET_LOGIN_LIMIT_PER_MINUTE: String(loginLimit) } });
    http = createHttpClient(server.baseURL, { maxSockets: opts.clients + 5 });
    const setup = await setUp(http, opts.clients);

    const recorder = new Recorder();
    const problems = new Map();
    const problemSamples = [];
    let tag = 0;
    const races = new RaceRounds(opts.clients, opts.raceEveryS * 1000);
    const sharedAttempts = [];
    const started = performance.now();
    const ctx = {
      http,
      recorder,
      deadline: started + opts.durationS * 1000,
      token: setup.token,
      signIns: new SignInSchedule(opts.signInEveryS * 1000, started),
      thinkMs: opts.thinkMs,
      races,
      supplierIds: setup.supplierIds,
      sharedDesignId: setup.shared.id,
      sharedAttempts,
      nextTag: () => ++tag,
      problem: (kind, message) => {
        problems.set(kind, (problems.get(kind) ?? 0) + 1);
        if (problemSamples.length < 15) problemSamples.push(message);
      },
    };
    if (opts.raceEveryS > 0) races.start();
    await Promise.all(setup.own.map((own) => runVirtualClient(ctx, own)));
    races.stop();
    const seconds = (performance.now() - started) / 1000;
    const rows = recorder.summary(seconds);

    console.log(`\n${formatSummary(rows)}\n`);
    console.log(`measured for ${seconds.toFixed(1)} s; load average now ${loadavg()[0].toFixed(2)}`);

    const exit = await server.stop();
    server = undefined;
    const stored = storedDesigns(dataDir, [...setup.own.map((o) => o.designId), setup.shared.id]);
    const invariantProblems = [
      ...(stored.integrity === 'ok' ? [] : [`PRAGMA integrity_check: ${stored.integrity}`]),
      ...checkOwnDesigns(setup.own, (id) => stored.designs.get(id)),
      ...checkSharedDesign(sharedAttempts, setup.shared.initial, stored.designs.get(setup.shared.id)),
    ];
    const wins = sharedAttempts.filter((a) => a.status === 200).length;
    const rounds = new Set(sharedAttempts.map((a) => a.baseVersion)).size;
    console.log(
      `invariants: ${setup.own.length} own designs compared with the database; shared design: ${sharedAttempts.length} ` +
        `saves on ${rounds} versions, ${wins} won, ${sharedAttempts.length - wins} refused with 409; ` +
        `server stopped ${exit.code === 0 || exit.signal === 'SIGTERM' ? 'cleanly' : JSON.stringify(exit)}`,
    );

    const failures = [];
    const overall = rows[rows.length - 1];
    const fiveHundreds = Object.entries(overall.statuses).filter(([s]) => s.startsWith('5'));
    if (fiveHundreds.length) failures.push(`server errors: ${fiveHundreds.map(([s, n]) => `${s}×${n}`).join(', ')}`);
    for (const [kind, n] of problems) failures.push(`${n} unexpected answer(s) to ${kind}`);
    failures.push(...invariantProblems);
    if (overall.count === 0) failures.push('no request was made');
    if (failures.length) {
      console.error(`\nFAIL\n  ${failures.join('\n  ')}`);
      if (problemSamples.length) console.error(`examples:\n  ${problemSamples.join('\n  ')}`);
      process.exitCode = 1;
    } else {
      console.log('\nPASS: no server error, no transport error, every acknowledged save is stored as acknowledged');
    }
  } finally {
    http?.close();
    if (server) {
      if (process.exitCode) console.error(server.log().slice(-4000));
      await server.stop();
    }
    await cleanUp();
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
