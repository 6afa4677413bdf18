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
