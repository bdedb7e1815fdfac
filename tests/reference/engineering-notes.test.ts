/**
 * The engineering notes (docs/engineering/) are the project's own reference: code and tests cite
 * them, never a document outside the repository. This test keeps it so:
 * - no tracked file cites the outside reference (the notes' own Markdown files excepted);
 * - every citation `docs/engineering/<file>.md §N` or `… CV-nn` names a note that exists and a
 *   section or check value that note has; every bare `CV-nn` is in check-values.md;
 * - inside the notes, links and `<file>.md §N` cross-references resolve, and the index
 *   (docs/engineering/README.md) lists every note.
 * See docs/engineering/README.md, "How code and tests cite the notes".
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const NOTES_DIR = 'docs/engineering';
const CHECK_VALUES = 'check-values.md';
const THIS_FILE = 'tests/reference/engineering-notes.test.ts';

/** Citations of the outside reference (built from pieces so that this file does not match itself). */
const OUTSIDE = [['ISOLATION', 'REFERENCE'].join('_'), ['..', 'shared', ''].join('/'), ['', 'work', 'shared'].join('/')];

/** What a note offers to cite: its § sections and (check-values.md) its CV ids. */
export interface Note {
  sections: Set<number>;
  checkValues: Set<number>;
}

/** Sections are headings `## §3 Title`; check values are headings `## CV-05 Title`. */
export function parseNote(text: string): Note {
  const sections = new Set<number>();
  const checkValues = new Set<number>();
  for (const m of text.matchAll(/^#{1,6}\s+§(\d+)\b/gm)) sections.add(Number(m[1]));
  for (const m of text.matchAll(/^#{1,6}\s+CV-(\d+)\b/gm)) checkValues.add(Number(m[1]));
  return { sections, checkValues };
}

/** `§3`, `§2–§4`, `CV-05` and lists of them joined by commas, dashes or "and". */
const TARGETS = String.raw`((?:\s*(?:,|–|-|and)?\s*(?:§\d+|CV-\d+))*)`;
/** A citation from anywhere in the repository. */
const CITATION = new RegExp(String.raw`docs/engineering/([A-Za-z0-9._-]+\.md)` + TARGETS, 'g');
/** Inside the notes: `transmissibility.md §3` or `[transmissibility.md](transmissibility.md) §3`. */
const NOTE_REFERENCE = new RegExp(String.raw`(?<![\w/.-])([a-z0-9-]+\.md)(?:\]\([^)\s]*\))?` + TARGETS, 'g');

function lineOf(text: string, index: number): number {
  let line = 1;
  for (let i = 0; i < index; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** The sections and check values a target list names; a range `§2–§4` names 2, 3 and 4. */
function targetsOf(list: string): { sections: number[]; checkValues: number[] } {
  const sections: number[] = [];
  const checkValues: number[] = [];
  for (const m of list.matchAll(/§(\d+)(?:\s*[–-]\s*§(\d+))?|CV-(\d+)/g)) {
    if (m[3] !== undefined) checkValues.push(Number(m[3]));
    else for (let n = Number(m[1]); n <= Number(m[2] ?? m[1]); n++) sections.push(n);
  }
  return { sections, checkValues };
}

function checkTargets(notes: ReadonlyMap<string, Note>, file: string, list: string, where: string): string[] {
  const note = notes.get(file);
  if (!note) return [`${where}: cites ${NOTES_DIR}/${file}, which does not exist`];
  const { sections, checkValues } = targetsOf(list);
  return [
    ...sections.filter((n) => !note.sections.has(n)).map((n) => `${where}: ${file} has no §${n}`),
    ...checkValues.filter((n) => !note.checkValues.has(n)).map((n) => `${where}: ${file} has no CV-${String(n).padStart(2, '0')}`),
  ];
}

/** Problems in one file of the repository (not a note). */
export function problemsInFile(path: string, text: string, notes: ReadonlyMap<string, Note>): string[] {
  const problems: string[] = [];
  for (const outside of OUTSIDE) {
    const at = text.indexOf(outside);
    if (at >= 0) problems.push(`${path}:${lineOf(text, at)}: cites "${outside}"; cite ${NOTES_DIR}/<topic>.md §N instead`);
  }
  for (const m of text.matchAll(CITATION)) problems.push(...checkTargets(notes, m[1], m[2], `${path}:${lineOf(text, m.index)}`));
  const values = notes.get(CHECK_VALUES)?.checkValues ?? new Set<number>();
  for (const m of text.matchAll(/\bCV-(\d+)\b/g)) {
    if (!values.has(Number(m[1]))) problems.push(`${path}:${lineOf(text, m.index)}: CV-${m[1]} is not in ${NOTES_DIR}/${CHECK_VALUES}`);
  }
  return problems;
}

/**
 * Problems in one note: citations, links and cross-references to other notes. A link into the
 * rest of the repository (`../../DEVELOPERS.md`) must name an existing file (`exists`, relative
 * to docs/engineering).
 */
export function problemsInNote(
  file: string,
  text: string,
  notes: ReadonlyMap<string, Note>,
  exists: (relativePath: string) => boolean = () => true,
): string[] {
  const problems: string[] = [];
  const where = (index: number) => `${NOTES_DIR}/${file}:${lineOf(text, index)}`;
  for (const m of text.matchAll(/\]\(([^)\s#]+\.md)(?:#[^)]*)?\)/g)) {
    const target = m[1];
    const ok = target.includes('/') ? exists(target) : notes.has(target);
    if (!ok) problems.push(`${where(m.index)}: links to ${target}, which does not exist`);
  }
  for (const m of text.matchAll(CITATION)) problems.push(...checkTargets(notes, m[1], m[2], where(m.index)));
  for (const m of text.matchAll(NOTE_REFERENCE)) {
    if (m[2].trim() !== '') problems.push(...checkTargets(notes, m[1], m[2], where(m.index)));
  }
  for (const m of text.matchAll(/\bCV-(\d+)\b/g)) {
    if (!notes.get(CHECK_VALUES)?.checkValues.has(Number(m[1]))) problems.push(`${where(m.index)}: CV-${m[1]} is not in ${CHECK_VALUES}`);
  }
  return problems;
}

function readNotes(): Map<string, { text: string; note: Note }> {
  const dir = join(ROOT, NOTES_DIR);
  const files = readdirSync(dir).filter((f) => f.endsWith('.md'));
  return new Map(
    files.map((f) => {
      const text = readFileSync(join(dir, f), 'utf8');
      return [f, { text, note: parseNote(text) }];
    }),
  );
}

function trackedFiles(): string[] {
  return execFileSync('git', ['ls-files', '-z'], { cwd: ROOT, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 })
    .split('\0')
    .filter((f) => f !== '' && existsSync(join(ROOT, f)));
}

describe('engineering notes: the checker itself', () => {
  const notes = new Map<string, Note>([
    ['transmissibility.md', parseNote('# T\n\n## §1 One\n\n## §2 Two\n\n## §3 Three\n')],
    [CHECK_VALUES, parseNote('# CV\n\n## CV-05 Five\n')],
  ]);

  it('accepts citations that resolve', () => {
    const text = '// docs/engineering/transmissibility.md §2–§3, §1; docs/engineering/check-values.md CV-05\nit("CV-05 [CF]")';
    expect(problemsInFile('a.ts', text, notes)).toEqual([]);
  });

  it('reports a missing note, section or check value, with file and line', () => {
    const text = [
      '// docs/engineering/no-such-topic.md §1',
      '// docs/engineering/transmissibility.md §4',
      '// docs/engineering/transmissibility.md §2–§5',
      '// docs/engineering/check-values.md CV-06',
      "it('CV-07 [CF]: …')",
    ].join('\n');
    expect(problemsInFile('a.ts', text, notes)).toEqual([
      'a.ts:1: cites docs/engineering/no-such-topic.md, which does not exist',
      'a.ts:2: transmissibility.md has no §4',
      'a.ts:3: transmissibility.md has no §4',
      'a.ts:3: transmissibility.md has no §5',
      'a.ts:4: check-values.md has no CV-06',
      'a.ts:4: CV-06 is not in docs/engineering/check-values.md',
      'a.ts:5: CV-07 is not in docs/engineering/check-values.md',
    ]);
  });

  it('reports a citation of the outside reference', () => {
    for (const outside of OUTSIDE) {
      expect(problemsInFile('b.ts', `x\n// see ${outside}X.md §3`, notes)).toEqual([
        `b.ts:2: cites "${outside}"; cite docs/engineering/<topic>.md §N instead`,
      ]);
    }
  });

  it('checks links and cross-references inside the notes', () => {
    const text = [
      'See [transmissibility.md](transmissibility.md) §3 and transmissibility.md §9; [x](missing.md).',
      'Also forced-response.md §2, [the guide](../../GUIDE.md) and check-values.md CV-05.',
    ].join('\n');
    expect(problemsInNote('sdof.md', text, notes, (path) => path !== '../../GUIDE.md')).toEqual([
      'docs/engineering/sdof.md:1: links to missing.md, which does not exist',
      'docs/engineering/sdof.md:2: links to ../../GUIDE.md, which does not exist',
      'docs/engineering/sdof.md:1: transmissibility.md has no §9',
      'docs/engineering/sdof.md:2: cites docs/engineering/forced-response.md, which does not exist',
    ]);
  });
});

describe('engineering notes in docs/engineering', () => {
  const notes = readNotes();
  const byFile = new Map([...notes].map(([f, n]) => [f, n.note]));

  it('has the index, the check values CV-01 … CV-29 and numbered sections in every topic', () => {
    expect(notes.has('README.md')).toBe(true);
    const values = byFile.get(CHECK_VALUES)?.checkValues ?? new Set<number>();
    for (let n = 1; n <= 29; n++) expect(values.has(n), `CV-${String(n).padStart(2, '0')}`).toBe(true);
    for (const [file, note] of byFile) {
      if (file === 'README.md' || file === CHECK_VALUES) continue;
      expect(note.sections.size, `${file} has § sections`).toBeGreaterThan(0);
    }
  });

  it('lists every note in the index', () => {
    const index = notes.get('README.md')?.text ?? '';
    const unlisted = [...notes.keys()].filter((f) => f !== 'README.md' && !index.includes(`](${f})`));
    expect(unlisted, 'add a row to docs/engineering/README.md for each').toEqual([]);
  });

  it('resolves every link and cross-reference inside the notes', () => {
    const exists = (relativePath: string) => existsSync(join(ROOT, NOTES_DIR, relativePath));
    const problems = [...notes].flatMap(([file, { text }]) => problemsInNote(file, text, byFile, exists));
    expect(problems).toEqual([]);
  });

  it('is what every tracked file cites: no outside reference, no dangling § or CV', () => {
    const problems: string[] = [];
    for (const path of trackedFiles()) {
      if (path.startsWith(`${NOTES_DIR}/`) && path.endsWith('.md')) continue;
      if (path === THIS_FILE) continue; // its examples above cite missing notes on purpose
      const text = readFileSync(join(ROOT, path), 'utf8');
      if (text.includes('\0')) continue; // binary
      problems.push(...problemsInFile(path, text, byFile));
    }
    expect(problems).toEqual([]);
  });
});
