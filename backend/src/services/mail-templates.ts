import type { OutgoingMail } from './mail.service';

export function invitationMail(args: { to: string; name: string; labName: string; link: string; invitedBy: string }): OutgoingMail {
  return {
    to: args.to,
    subject: `You are invited to ${args.labName} on Tracewright`,
    text: [
      `Hello ${args.name},`,
      '',
      `${args.invitedBy} has invited you to ${args.labName} on Tracewright.`,
      'Open this link to choose your password (it works once, for 7 days):',
      '',
      args.link,
      '',
      'If you did not expect this, you can ignore this mail.',
    ].join('\n'),
  };
}

export function passwordResetMail(args: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: args.to,
    subject: 'Reset your Tracewright password',
    text: [
      `Hello ${args.name},`,
      '',
      'Someone asked to reset the password of this account. Open this link to choose a new one',
      '(it works once, for 1 hour):',
      '',
      args.link,
      '',
      'If it was not you, ignore this mail; your password stays as it is.',
    ].join('\n'),
  };
}

interface VersionMailArgs {
  recipeCode: string;
  recipeName: string;
  versionNumber: number;
  link: string;
}

const versionLabel = (a: VersionMailArgs) => `${a.recipeCode} version ${a.versionNumber}`;

export function reviewRequestedMail(args: VersionMailArgs & { to: string[]; submittedBy: string; warnings: number }): OutgoingMail {
  return {
    to: args.to,
    subject: `Review requested: ${versionLabel(args)} (${args.recipeName})`,
    text: [
      'Hello,',
      '',
      `${args.submittedBy} has sent ${versionLabel(args)} of “${args.recipeName}” to quality for review.`,
      args.warnings > 0 ? `The process checks show ${args.warnings} warning(s) and nothing blocking; look at them before you release.` : 'The process checks show nothing blocking.',
      '',
      'Open it to review, release with your signature, or send it back with a comment:',
      '',
      args.link,
    ].join('\n'),
  };
}

export function versionReleasedMail(args: VersionMailArgs & { to: string; name: string; releasedBy: string; retiredNumber: number | null }): OutgoingMail {
  return {
    to: args.to,
    subject: `Released: ${versionLabel(args)}`,
    text: [
      `Hello ${args.name},`,
      '',
      `${args.releasedBy} has signed and released ${versionLabel(args)} of “${args.recipeName}” (approved for production).`,
      args.retiredNumber === null ? 'Operators can now run it.' : `Operators now run it; version ${args.retiredNumber} is retired.`,
      '',
      args.link,
    ].join('\n'),
  };
}

export function versionSentBackMail(args: VersionMailArgs & { to: string; name: string; sentBackBy: string; comment: string }): OutgoingMail {
  return {
    to: args.to,
    subject: `Sent back: ${versionLabel(args)}`,
    text: [
      `Hello ${args.name},`,
      '',
      `${args.sentBackBy} has sent ${versionLabel(args)} of “${args.recipeName}” back to draft with this comment:`,
      '',
      ...args.comment.split('\n').map((line) => `> ${line}`),
      '',
      'Open it to make the changes and submit it again:',
      '',
      args.link,
    ].join('\n'),
  };
}

export function problemReportedMail(args: {
  to: string[];
  runCode: string;
  recipeCode: string;
  severity: string;
  title: string;
  description: string;
  reportedBy: string;
  photoCount: number;
  link: string;
  deviationLink: string;
}): OutgoingMail {
  return {
    to: args.to,
    subject: `${args.severity === 'critical' ? 'Critical' : 'Major'} problem reported: run ${args.runCode}`,
    text: [
      'Hello,',
      '',
      `${args.reportedBy} has reported a ${args.severity} problem on run ${args.runCode}${args.recipeCode ? ` (${args.recipeCode})` : ''}:`,
      '',
      args.title,
      ...args.description.split('\n').map((line) => `> ${line}`),
      '',
      args.photoCount > 0 ? `${args.photoCount} photo(s) are attached to the deviation.` : 'No photos were attached.',
      'It waits in the deviation queue for review. Open the deviation, or the run:',
      '',
      args.deviationLink,
      args.link,
    ].join('\n'),
  };
}
