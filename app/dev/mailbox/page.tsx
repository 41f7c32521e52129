import { notFound } from 'next/navigation';
import { AppHeader } from '@/components/shell/app-header';
import { getSessionCaller } from '@/lib/auth';
import { listDevMessages } from '@/lib/data/dev-mail';
import { devMailboxAllowed } from '@/lib/dev-mailbox';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Dev mailbox' };

export default async function DevMailboxPage() {
  if (!devMailboxAllowed(await getSessionCaller())) notFound();
  const messages = await listDevMessages();
  return (
    <>
      <AppHeader />
      <main id="main" className="mx-auto max-w-4xl px-4 py-6">
        <h1 className="text-2xl font-semibold">Dev mailbox</h1>
        <p className="mt-1 text-sm text-ink-soft">Every message the app sent to the local mail catcher, newest first. No real mail leaves this machine.</p>
        {messages.length === 0 ? <p className="mt-6 text-sm">No messages yet.</p> : null}
        <ul className="mt-6 flex flex-col gap-4">
          {messages.map((m) => (
            <li key={m.id} className="rounded-lg border border-line bg-white p-4" data-testid="dev-message">
              <p className="text-xs text-ink-faint">
                <span className="num">{new Date(m.receivedAt).toISOString().replace('T', ' ').slice(0, 19)}</span> · to {m.to}
              </p>
              <h2 className="mt-1 font-semibold">{m.subject}</h2>
              <pre className="mt-2 whitespace-pre-wrap wrap-anywhere text-sm">{m.text}</pre>
              {m.links.map((link) => (
                <a key={link} href={link} className="mt-2 block break-all text-sm text-mains underline">
                  {link}
                </a>
              ))}
            </li>
          ))}
        </ul>
      </main>
    </>
  );
}
