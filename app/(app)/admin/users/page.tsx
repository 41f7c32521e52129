import { notFound } from 'next/navigation';
import { pageCaller } from '@/components/shell/require-caller';
import { SiteRoleControl } from '@/components/admin/site-role-control';
import { listUsers } from '@/lib/data/users';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Users' };

export default async function AdminUsersPage() {
  const caller = await pageCaller('/admin/users');
  if (caller.siteRole !== 'admin') notFound();
  const users = await listUsers();
  return (
    <div className="max-w-5xl">
      <h1 className="text-2xl font-semibold">Users</h1>
      <p className="mt-1 text-sm text-ink-soft">
        Every account on this Seamline site ({users.length}). A site admin manages accounts, not what is in the workspaces; the site always keeps at least one.
      </p>
      <div className="mt-4 relative overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-line bg-shade text-xs uppercase tracking-wide text-ink-faint">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th className="px-3 py-2">E-mail</th>
              <th className="px-3 py-2">Site role</th>
              <th className="px-3 py-2">Workspaces</th>
              <th className="px-3 py-2">Joined</th>
              <th className="px-3 py-2">
                <span className="sr-only">Change the site role</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id} className="border-b border-line last:border-0">
                <td className="px-3 py-2">{u.name}</td>
                <td className="px-3 py-2">{u.email}</td>
                <td className="whitespace-nowrap px-3 py-2" data-testid={`site-role-${u.id}`}>
                  {u.siteRole === 'admin' ? 'site admin' : 'member'}
                </td>
                <td className="num px-3 py-2">{u.workspaceCount}</td>
                <td className="num whitespace-nowrap px-3 py-2">{u.createdAt.slice(0, 10)}</td>
                <td className="px-3 py-2">
                  <SiteRoleControl user={u} isSelf={u.id === caller.id} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
