import type { UnitSystem } from '@tacet/vibration';
import { changeLines, type SubmissionChanges } from './input-changes.js';

/**
 * The words of the review e-mails (pure, so they are tested on their own). Each message says
 * what happened, who did it, what they wrote, and links to the page.
 */
export interface DesignRef {
  name: string;
  revision: number;
  projectName: string;
}

export interface Notice {
  subject: string;
  text: string;
}

const title = (design: DesignRef) => `${design.name}, revision ${design.revision} of ${design.projectName}`;
const quoted = (text: string) => text.split('\n').map((line) => `> ${line}`);

/** The changes of a submission as lines for one reader, with their heading. */
export function changesParagraph(changes: SubmissionChanges | null, system: UnitSystem): string[] {
  if (!changes) return [];
  const since = changes.sinceRevision === null ? 'since it was last sent for check' : `since revision ${changes.sinceRevision}`;
  if (changes.items.length === 0) return [`Nothing in the input or the chosen mounts changed ${since}.`];
  return [`What changed ${since}:`, ...changeLines(changes.items, system).map((line) => `- ${line}`)];
}

export function sentForCheckNotice(args: {
  design: DesignRef;
  author: string;
  recipient: { name: string; unitSystem: UnitSystem };
  askedYou: boolean;
  note: string | null;
  changes: SubmissionChanges | null;
  link: string;
}): Notice {
  const { design, author, recipient } = args;
  const lines = [
    `Hello ${recipient.name},`,
    '',
    `${author} sent ${title(design)} for check${args.askedYou ? ' and asked you to check it' : ''}.`,
  ];
  if (args.note) lines.push('', `${author} wrote:`, ...quoted(args.note));
  const changes = changesParagraph(args.changes, recipient.unitSystem);
  if (changes.length) lines.push('', ...changes);
  lines.push(
    '',
    `Open the design: ${args.link}`,
    '',
    'An engineer other than the author checks it, then releases it or sends it back with a comment.',
  );
  return { subject: `Please check: ${design.name} rev ${design.revision} (${design.projectName})`, text: lines.join('\n') };
}

export function returnedNotice(args: { design: DesignRef; checker: string; recipient: string; comment: string; link: string }): Notice {
  const lines = [
    `Hello ${args.recipient},`,
    '',
    `${args.checker} sent ${title(args.design)} back to you as a draft, with this comment:`,
    ...quoted(args.comment),
    '',
    `Open the design: ${args.link}`,
    '',
    'Change what is needed, then send it for check again with a reply to the comment.',
  ];
  return {
    subject: `Returned to you: ${args.design.name} rev ${args.design.revision} (${args.design.projectName})`,
    text: lines.join('\n'),
  };
}

export function releasedNotice(args: {
  design: DesignRef;
  checker: string;
  recipient: string;
  forPurchasing: boolean;
  notes: string | null;
  link: string;
}): Notice {
  const lines = [`Hello ${args.recipient},`, '', `${args.checker} checked and released ${title(args.design)}.`];
  if (args.notes) lines.push('', 'Release notes:', ...quoted(args.notes));
  lines.push(
    '',
    args.forPurchasing
      ? `Its bill of materials and calculation report are ready for purchasing: ${args.link}`
      : `Open the design: ${args.link}`,
  );
  return { subject: `Released: ${args.design.name} rev ${args.design.revision} (${args.design.projectName})`, text: lines.join('\n') };
}
