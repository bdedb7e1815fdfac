#!/usr/bin/env node
// `npm run test:load`: a load test of the built server on loopback. It starts the server in
// demo mode on a free port with a throw-away data folder (tools/harness), starts virtual
// engineers one after another over a ramp, runs them for a while (sign-in, catalog search,
// selection, design saves with version checks, and rounds in which all of them save one shared
// design at once), prints requests/s and latency percentiles per kind of request for the whole
// run and for the part after the ramp, judges the latency targets, then checks against the
// database that every acknowledged save is stored.
// Exit 1 on any 5xx, transport error, unexpected status or broken invariant; a missed latency
// target is reported, not failed (timings on a shared machine vary).
//
//   node tools/load/run.mjs [--duration 60] [--clients 50] [--ramp S] [--race-every 5] [--sign-in-every 3] [--think 0]
//   (or TACET_LOAD_DURATION / TACET_LOAD_CLIENTS / TACET_LOAD_RAMP; TACET_LOAD_SERVER_NODE_ARGS for the
//   server's node, e.g. '--cpu-prof --cpu-prof-dir=/tmp/prof'). Needs `npm run build` first.
//
// Why a ramp: Node (libuv ≥ 1.45, Node 20) accepts one new connection per turn of its event loop.
// A saturated server's turn is long (it serves every open connection that has a request ready),
// so of 50 connections opened in the same instant the last one waits about 50 turns before the
// server reads it: seconds, measured as the latency of the first requests. Clients that arrive
// one after another, as people do, open their connections a turn or two apart. The requests
// that opened a connection are reported on their own line, and the whole run (ramp included)
// is reported beside the part after the ramp.
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import Database from 'better-sqlite3';
import { DEMO_PASSWORD, tagOfInput, taggedInput } from '../harness/fixtures.mjs';
import { cleanUp, nodeArgsFrom, startServer, tempFolder } from '../harness/server.mjs';
import { createHttpClient } from './http-client.mjs';
import { checkOwnDesigns, checkSharedDesign } from './invariants.mjs';
import { ENGINEER, RaceRounds, SignInSchedule, rampStart, runVirtualClient } from './scenario.mjs';
import { Recorder, TARGETS, formatSummary, judgeLatency, slowestKind } from './stats.mjs';

/** The 1, 5 and 15 minute load averages. */
const loadAverages = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

/** Seconds of ramp per client when --ramp is not given (5 s for 50 clients), at most half the run. */
const DEFAULT_RAMP_PER_CLIENT_S = 0.1;

function options(argv, env) {
  const value = (name, envName, fallback) => {
    const i = argv.indexOf(`--${name}`);
    const raw = i >= 0 ? argv[i + 1] : env[envName];
    const n = raw === undefined || raw === '' ? fallback : Number(raw);
    if (!Number.isFinite(n) || n < 0) throw new Error(`--${name} must be a number (got ${raw})`);
    return n;
  };
  const durationS = value('duration', 'TACET_LOAD_DURATION', 60);
  const clients = Math.max(1, Math.round(value('clients', 'TACET_LOAD_CLIENTS', 50)));
  const rampS = value('ramp', 'TACET_LOAD_RAMP', Math.min(DEFAULT_RAMP_PER_CLIENT_S * clients, durationS / 2));
  if (rampS >= durationS) throw new Error(`--ramp (${rampS} s) must be shorter than --duration (${durationS} s)`);
  return {
    durationS,
    clients,
    rampS,
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
    `Load test: ${opts.clients} clients for ${opts.durationS} s, started one after another over ${opts.rampS} s, ` +
      `shared-design race every ${opts.raceEveryS} s, a sign-in every ${opts.signInEveryS} s (limit ${loginLimit}/min), ` +
      `think time ${opts.thinkMs} ms; ${cpus().length} CPUs, load average ${loadAverages()}`,
  );
  // Our own data folder: the database is read after the server has stopped.
  const dataDir = tempFolder('tacet-load-');
  let server;
  let http;
  try {
    server = await startServer({
      dataDir,
      env: { TACET_LOGIN_LIMIT_PER_MINUTE: String(loginLimit) },
      // e.g. TACET_LOAD_SERVER_NODE_ARGS='--cpu-prof --cpu-prof-dir=/tmp/prof' to profile the server under load
      nodeArgs: nodeArgsFrom(process.env.TACET_LOAD_SERVER_NODE_ARGS),
    });
    http = createHttpClient(server.baseURL, { maxSockets: opts.clients + 5 });
    const setup = await setUp(http, opts.clients);

    const recorder = new Recorder();
    const problems = new Map();
    const problemSamples = [];
    let tag = 0;
    const races = new RaceRounds(opts.clients, opts.raceEveryS * 1000);
    const sharedAttempts = [];
    const started = performance.now();
    const rampMs = opts.rampS * 1000;
    // The steady part of the run begins when the ramp has ended and every client has had its
    // first answer (a saturated server may still hold new connections unread after the ramp).
    let allRunning = -Infinity;
    let running = 0;
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
      answered: () => {
        if (++running === opts.clients) allRunning = performance.now();
      },
      problem: (kind, message) => {
        problems.set(kind, (problems.get(kind) ?? 0) + 1);
        if (problemSamples.length < 15) problemSamples.push(message);
      },
    };
    // The race needs every client: its rounds begin once the last one has started.
    if (opts.raceEveryS > 0) races.start(rampMs);
    await Promise.all(setup.own.map((own, i) => runVirtualClient(ctx, own, started + rampStart(i, opts.clients, rampMs))));
    races.stop();
    const ended = performance.now();
    const seconds = (ended - started) / 1000;
    // Without an answer for every client there is no steady part: its figures stay empty (not met).
    const steadyFrom = running === opts.clients ? Math.max(started + rampMs, allRunning) : ended;
    const steadyS = (ended - steadyFrom) / 1000;
    const whole = recorder.summary(seconds);
    const afterRamp = recorder.summary(steadyS, { from: steadyFrom });
    const opened = recorder.newConnections();

    console.log(`\nWhole run, ramp included (${seconds.toFixed(1)} s):\n${formatSummary(whole)}`);
    const at = (t) => `${((t - started) / 1000).toFixed(1)} s`;
    console.log(
      `\nAfter the ramp: requests sent from ${at(steadyFrom)} to the end, all ${opts.clients} clients running ` +
        `(the ramp ended at ${opts.rampS} s; ` +
        (running === opts.clients
          ? `the last client had its first answer at ${at(allRunning)}`
          : `only ${running} of ${opts.clients} clients had an answer by the end`) +
        `):\n${formatSummary(afterRamp)}`,
    );
    console.log(
      `\nnew connections: ${opened.count} requests opened one (the rest reused an idle one), p50 ${opened.p50.toFixed(1)} ms, ` +
        `max ${opened.max.toFixed(1)} ms, the last sent at ${at(opened.lastAt)}`,
    );
    console.log(`measured for ${seconds.toFixed(1)} s; load average now ${loadAverages()}`);

    const exit = await server.stop();
    server = undefined;
    const stored = storedDesigns(dataDir, [...setup.own.map((o) => o.designId), setup.shared.id]);
    const lostWrites = checkOwnDesigns(setup.own, (id) => stored.designs.get(id));
    const invariantProblems = [
      ...(stored.integrity === 'ok' ? [] : [`PRAGMA integrity_check: ${stored.integrity}`]),
      ...lostWrites,
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
    const overall = whole[whole.length - 1];
    const errors = Object.entries(overall.statuses).filter(([s]) => s.startsWith('5') || s === 'transport error');
    const errorCount = errors.reduce((sum, [, n]) => sum + n, 0);
    if (errors.length) failures.push(`server or transport errors: ${errors.map(([s, n]) => `${s}×${n}`).join(', ')}`);
    for (const [kind, n] of problems) failures.push(`${n} unexpected answer(s) to ${kind}`);
    failures.push(...invariantProblems);
    if (overall.count === 0) failures.push('no request was made');

    const verdict = (met) => (met ? 'met' : 'NOT met');
    const latency = judgeLatency(afterRamp[afterRamp.length - 1]);
    const top = slowestKind(afterRamp);
    const slowest = top.kind ? `, ${top.kind}; the other kinds at most ${top.othersMax.toFixed(1)} ms` : '';
    console.log(
      `\ntargets (${TARGETS.clients} clients, after the ramp${opts.clients === TARGETS.clients ? '' : `; this run has ${opts.clients}, for comparison only`}): ` +
        [
          ...latency.map(
            (t) => `${t.what} < ${t.limit} ms: ${verdict(t.met)} (${t.value.toFixed(1)} ms${t.what === 'maximum' ? slowest : ''})`,
          ),
          `errors 0: ${verdict(errorCount === 0)} (${errorCount})`,
          `lost writes 0: ${verdict(lostWrites.length === 0)} (${lostWrites.length})`,
        ].join('; '),
    );

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
