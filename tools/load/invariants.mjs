// What must hold after the load test, checked against the database itself.

/**
 * @typedef {{ version: number, name: string, tag: number }} DesignState
 * @typedef {{ baseVersion: number, status: number | string, version?: number, tag: number }} SharedAttempt
 */

/**
 * Every client's own design: the stored row is its last acknowledged save (only that client
 * writes it, so nothing else may have moved it).
 * @param {Array<{ client: number, designId: number, acknowledged: DesignState }>} clients
 * @param {(designId: number) => DesignState | undefined} storedOf
 * @returns {string[]} problems
 */
export function checkOwnDesigns(clients, storedOf) {
  const problems = [];
  for (const { client, designId, acknowledged } of clients) {
    const stored = storedOf(designId);
    if (!stored) {
      problems.push(`client ${client}: design ${designId} is not in the database`);
      continue;
    }
    for (const field of ['version', 'name', 'tag']) {
      if (stored[field] !== acknowledged[field]) {
        problems.push(
          `client ${client}: design ${designId} stores ${field} ${JSON.stringify(stored[field])}, ` +
            `the last acknowledged save gave ${JSON.stringify(acknowledged[field])}`,
        );
      }
    }
  }
  return problems;
}

/**
 * The design all clients race on: for every version some client based a save on, exactly one
 * save won (200, the next version) and the others got 409; the winners make an unbroken chain
 * from the first version to the stored one, and the stored content is the last winner's.
 * @param {SharedAttempt[]} attempts
 * @param {DesignState} initial
 * @param {DesignState | undefined} stored
 * @returns {string[]} problems
 */
export function checkSharedDesign(attempts, initial, stored) {
  const problems = [];
  if (!stored) return ['the shared design is not in the database'];
  /** @type {Map<number, SharedAttempt[]>} */
  const byBase = new Map();
  for (const attempt of attempts) {
    if (attempt.status !== 200 && attempt.status !== 409) {
      problems.push(`a save of the shared design on version ${attempt.baseVersion} answered ${attempt.status}`);
    }
    const group = byBase.get(attempt.baseVersion) ?? [];
    group.push(attempt);
    byBase.set(attempt.baseVersion, group);
  }
  /** @type {Map<number, SharedAttempt>} winner by the version it created */
  const winners = new Map();
  for (const [base, group] of [...byBase].sort(([a], [b]) => a - b)) {
    const won = group.filter((a) => a.status === 200);
    if (won.length !== 1) {
      problems.push(`version ${base} of the shared design: ${won.length} saves won of ${group.length} (exactly one must)`);
    }
    for (const w of won) {
      if (w.version !== base + 1) problems.push(`a save on version ${base} returned version ${w.version}, not ${base + 1}`);
      else winners.set(w.version, w);
    }
  }
  for (let v = initial.version + 1; v <= stored.version; v++) {
    if (!winners.has(v)) problems.push(`the shared design reached version ${v} without an acknowledged save`);
  }
  const last = Math.max(initial.version, ...winners.keys());
  if (stored.version !== last) problems.push(`the shared design stores version ${stored.version}; the last acknowledged save made ${last}`);
  const expectedTag = last === initial.version ? initial.tag : winners.get(last)?.tag;
  if (stored.tag !== expectedTag) {
    problems.push(`the shared design stores the content of save ${stored.tag}; the winner of version ${last} sent ${expectedTag}`);
  }
  return problems;
}
