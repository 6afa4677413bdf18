import { stateInWords, type DeviationSummary } from '@tracewright/shared';

import type { OutgoingMail } from './mail.service';

const capital = (word: string) => word.charAt(0).toUpperCase() + word.slice(1);

/** An automatic deviation of major or critical severity, as quality hears of it at once. */
export function deviationRaisedMail(args: {
  to: string[];
  deviation: Pick<DeviationSummary, 'id' | 'severity' | 'title' | 'expected' | 'actual'>;
  runCode: string;
  recipeCode: string;
  raisedBy: string;
  link: string;
}): OutgoingMail {
  const { deviation } = args;
  return {
    to: args.to,
    subject: `${capital(deviation.severity)} deviation on run ${args.runCode}: ${deviation.title}`,
    text: [
      'Hello,',
      '',
      `Run ${args.runCode} (${args.recipeCode}) raised a ${deviation.severity} deviation while ${args.raisedBy} was recording it:`,
      '',
      deviation.title,
      `Expected: ${deviation.expected}`,
      `Actual: ${deviation.actual}`,
      '',
      'It waits in the deviation queue for review and a disposition:',
      '',
      args.link,
    ].join('\n'),
  };
}

export interface DigestLine {
  id: number;
  severity: string;
  state: string;
  title: string;
  runCode: string;
  ageDays: number;
}

/** The daily digest: how many deviations are not closed, by severity and state, and the most pressing first. */
export function deviationDigestMail(args: {
  to: string[];
  labName: string;
  total: number;
  bySeverity: Record<string, number>;
  byState: Record<string, number>;
  lines: readonly DigestLine[];
  link: string;
}): OutgoingMail {
  const counts = (record: Record<string, number>) => Object.entries(record).map(([k, n]) => `${n} ${k}`).join(', ');
  const shown = args.lines.map((l) => `- #${l.id} [${l.severity}, ${stateInWords(l.state)}, ${Math.floor(l.ageDays)} d] ${l.title} (run ${l.runCode})`);
  const more = args.total - args.lines.length;
  return {
    to: args.to,
    subject: `${args.labName}: ${args.total} deviation${args.total === 1 ? '' : 's'} not yet closed`,
    text: [
      'Hello,',
      '',
      `${args.total} deviation${args.total === 1 ? ' is' : 's are'} not yet closed: ${counts(args.bySeverity)}.`,
      `By state: ${counts(args.byState)}.`,
      '',
      'Most pressing first (severity, then oldest):',
      ...shown,
      ...(more > 0 ? [`…and ${more} more in the queue.`] : []),
      '',
      'Open the queue:',
      '',
      args.link,
    ].join('\n'),
  };
}
