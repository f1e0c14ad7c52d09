// @ts-nocheck
import type { OutgoingMail } from './mailer';

/** The invitation e-mail: plain words, the link on a line of its own so every mail client can open it. */
export function inviteMail(input: { to: string; projectName: string; role: string; inviterName: string; link: string; expiresAt: Date }): OutgoingMail {
  const until = input.expiresAt.toISOString().slice(0, 16).replace('T', ' ');
  return {
    to: input.to,
    subject: `${input.inviterName} invited you to "${input.projectName}" on Tramontane`,
    text: [
      `${input.inviterName} invited you to the Tramontane project "${input.projectName}" as ${input.role}.`,
      '',
      'Open this link, sign in with this e-mail address, and accept:',
      input.link,
      '',
      `The link works once and until ${until} UTC.`,
      'If you did not expect this, ignore this message.',
    ].join('\n'),
  };
}

/** The opt-in notice that a run has finished. */
export function runFinishedMail(input: { to: string; projectName: string; runName: string; link: string; kind?: 'run' | 'sweep' }): OutgoingMail {
  const what = input.kind === 'sweep' ? 'sweep' : 'run';
  return {
    to: input.to,
    subject: `${what === 'sweep' ? 'Sweep' : 'Run'} finished: ${input.runName} (${input.projectName})`,
    text: [
      `The ${what} "${input.runName}" in "${input.projectName}" has finished.`,
      '',
      `See the results: ${input.link}`,
      '',
      'You get these notices because you turned them on in your Tramontane settings; turn them off there.',
    ].join('\n'),
  };
}
