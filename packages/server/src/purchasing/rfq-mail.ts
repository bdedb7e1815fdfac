import { cautionLines } from '@tacet/vibration';
import type { QuoteLine } from './bom-export.js';

/**
 * The words of a request for quotation (pure, tested on their own). What goes to a supplier
 * names parts, quantities and where they go — never a price of ours.
 */
export function rfqNotice(args: {
  supplier: string;
  design: { name: string; revision: number; projectName: string };
  message: string | null;
  machineCount: number;
  lines: readonly QuoteLine[];
  /** `RFQ-12`; null in a preview, before the request has its number. */
  reference: string | null;
  sender: { name: string; email: string };
}): { subject: string; text: string } {
  const { design, machineCount } = args;
  const reference = args.reference ?? 'RFQ-(number given when it is sent)';
  const machines = machineCount === 1 ? 'one machine' : `${machineCount} identical machines`;
  const text = [
    `Hello ${args.supplier},`,
    '',
    `Please quote the resilient mounts below for ${design.projectName}, design ${design.name}, revision ${design.revision}, for ${machines}.`,
    ...(args.message ? ['', args.message] : []),
    '',
    ...args.lines.map((line) => {
      const perMachine = machineCount > 1 ? `${line.quantityPerMachine} per machine; ` : '';
      return `- ${line.partNumber}: ${line.quantity} pcs (${perMachine}mount points ${line.mountPoints.join(', ')})`;
    }),
    '',
    'Please give a unit price and a lead time for each line, and how long your quote holds.',
    'The list is attached as CSV and Excel files, with the calculation report.',
    `Please reply to ${args.sender.name} <${args.sender.email}>, quoting reference ${reference}.`,
    '',
    ...cautionLines('supplier'),
  ].join('\n');
  return { subject: `Request for quotation: ${design.name} rev ${design.revision} (${design.projectName})`, text };
}

/** The sender's copy: what went to whom, and a link to follow the request up. */
export function rfqCopyNotice(args: {
  recipient: string;
  supplier: string;
  to: string;
  reference: string;
  sentText: string;
  attachments: readonly string[];
  link: string;
}): { subject: string; text: string } {
  const text = [
    `Hello ${args.recipient},`,
    '',
    `Your request for quotation ${args.reference} went to ${args.supplier} <${args.to}>. This is what they received:`,
    '',
    ...args.sentText.split('\n').map((line) => `> ${line}`),
    '',
    `Attached for them: ${args.attachments.join(', ')}.`,
    '',
    `Record their quote and follow the order up here: ${args.link}`,
  ].join('\n');
  return { subject: `Sent: ${args.reference} to ${args.supplier}`, text };
}
