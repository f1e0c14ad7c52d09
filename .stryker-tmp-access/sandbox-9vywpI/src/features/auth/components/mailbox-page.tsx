// @ts-nocheck
import { useState } from 'react';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useMailbox, type MailboxMessage } from '../api/get-mailbox';

const time = (iso: string) => iso.slice(0, 16).replace('T', ' ');

/** The local fake SMTP server's catch, for admins in the default set-up: follow an invite without real mail. */
export function MailboxPage() {
  const mailbox = useMailbox();
  const [openId, setOpenId] = useState<string | null>(null);
  if (mailbox.isPending) return <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading mailbox" />;
  if (mailbox.isError)
    return (
      <Notice tone="bad" title="The mailbox could not be opened">
        {mailbox.error.message}
      </Notice>
    );
  const messages = mailbox.data.messages;
  const open = messages.find((m) => m.id === openId) ?? messages[0];
  return (
    <div className="space-y-4">
      <Notice title="Local mailbox">
        Every message Tramontane sent through the local stand-in mail server. With real SMTP settings, mail goes out instead and this page is not there.
      </Notice>
      {messages.length === 0 ? (
        <Panel title="Mailbox">
          <p className="text-sm text-ink-soft">No mail yet. Invite someone to a project and the message appears here.</p>
        </Panel>
      ) : (
        <div className="grid gap-4 lg:grid-cols-[22rem_1fr]">
          <Panel title={`Mailbox · ${messages.length}`}>
            <ul className="-m-2 divide-y divide-rule" aria-label="Messages">
              {messages.map((m) => (
                <li key={m.id}>
                  <button
                    type="button"
                    onClick={() => setOpenId(m.id)}
                    aria-current={m.id === open?.id}
                    className={`w-full px-2 py-2 text-left text-sm ${m.id === open?.id ? 'bg-mist' : 'hover:bg-paper'}`}
                  >
                    <span className="block truncate font-medium">{m.subject || '(no subject)'}</span>
                    <span className="block truncate text-xs text-ink-soft">to {m.to.join(', ')}</span>
                    <span className="num block text-xs text-ink-faint">{time(m.receivedAt)} UTC</span>
                  </button>
                </li>
              ))}
            </ul>
          </Panel>
          {open && <MessageView message={open} />}
        </div>
      )}
    </div>
  );
}

function MessageView({ message }: { message: MailboxMessage }) {
  return (
    <Panel title={message.subject || '(no subject)'}>
      <dl className="mb-3 grid grid-cols-[4rem_1fr] gap-y-0.5 text-xs">
        <dt className="text-ink-faint">From</dt>
        <dd>{message.from}</dd>
        <dt className="text-ink-faint">To</dt>
        <dd>{message.to.join(', ')}</dd>
        <dt className="text-ink-faint">Received</dt>
        <dd className="num">{time(message.receivedAt)} UTC</dd>
      </dl>
      <div className="space-y-1 border-t border-rule pt-3 text-sm leading-relaxed" data-testid="message-body">
        {message.text.split('\n').map((line, i) =>
          /^https?:\/\/\S+$/.test(line.trim()) ? (
            <p key={i} className="break-all">
              <a className="text-harbour-soft underline" href={line.trim()}>
                {line.trim()}
              </a>
            </p>
          ) : (
            <p key={i} className="min-h-[1em] whitespace-pre-wrap">
              {line}
            </p>
          ),
        )}
      </div>
    </Panel>
  );
}
