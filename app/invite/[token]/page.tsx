import Link from 'next/link';
import { AcceptInvitation } from '@/components/team/accept-invitation';
import { Wordmark } from '@/components/ui/mark';
import { Notice } from '@/components/ui/notice';
import { getSessionCaller } from '@/lib/auth';
import { previewInvitation } from '@/lib/data/invitations';
import { AppError } from '@/lib/errors';

export const metadata = { title: 'Invitation' };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const caller = await getSessionCaller();
  let preview: Awaited<ReturnType<typeof previewInvitation>> | null = null;
  let problem: string | null = null;
  try {
    preview = await previewInvitation(token);
  } catch (e) {
    problem = e instanceof AppError ? e.message : 'This invitation cannot be opened right now.';
  }
  return (
    <main id="main" className="flex min-h-screen flex-col items-center px-4 py-10">
      <Wordmark size={34} />
      <div className="mt-8 w-full max-w-md rounded-lg border border-line bg-white p-6">
        <h1 className="text-xl font-semibold">Workspace invitation</h1>
        {problem ? (
          <div className="mt-4">
            <Notice kind="error">{problem}</Notice>
          </div>
        ) : preview ? (
          <>
            <p className="mt-3 text-sm">
              You are invited to <strong>{preview.workspaceName}</strong> as <strong>{preview.role}</strong> ({preview.email}).
            </p>
            {caller ? (
              <AcceptInvitation token={token} />
            ) : (
              <p className="mt-4 text-sm">
                <Link className="text-mains underline" href={`/sign-in?callbackUrl=${encodeURIComponent(`/invite/${token}`)}`}>
                  Sign in
                </Link>{' '}
                or{' '}
                <Link className="text-mains underline" href="/sign-up">
                  create an account
                </Link>{' '}
                with {preview.email} to accept.
              </p>
            )}
          </>
        ) : null}
      </div>
    </main>
  );
}
