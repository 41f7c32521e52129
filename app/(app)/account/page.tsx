import { AccessTokens } from '@/components/account/access-tokens';
import { DeleteAccount } from '@/components/account/delete-account';
import { pageCaller } from '@/components/shell/require-caller';

export const metadata = { title: 'Account' };

export default async function AccountPage() {
  const caller = await pageCaller('/account');
  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-6">
      <div className="flex flex-col gap-3">
        <h1 className="text-2xl font-semibold">Account</h1>
        <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-1 rounded-lg border border-line bg-white p-4 text-sm">
          <dt className="text-ink-faint">Name</dt>
          <dd data-testid="account-name" className="wrap-anywhere">
            {caller.name}
          </dd>
          <dt className="text-ink-faint">E-mail</dt>
          <dd data-testid="account-email" className="wrap-anywhere">
            {caller.email}
          </dd>
        </dl>
      </div>
      <AccessTokens />
      <DeleteAccount />
    </div>
  );
}
