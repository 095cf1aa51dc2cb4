import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { listMembersPage } from '@/lib/accounts/roles';
import { Refused } from '@/components/account/Refused';
import { RolePicker } from './RolePicker';

export const metadata: Metadata = { title: 'Members and roles' };
export const dynamic = 'force-dynamic';

const PER_PAGE = 50;

export default async function AdminUsersPage({
  searchParams,
}: {
  searchParams: Promise<{ page?: string | string[] }>;
}) {
  const raw = (await searchParams).page;
  const asked = Number(Array.isArray(raw) ? raw[0] : raw);
  const page = Number.isInteger(asked) && asked >= 1 && asked <= 1_000_000 ? asked : 1;

  let data: Awaited<ReturnType<typeof listMembersPage>> | null = null;
  let viewerId = 0;
  const user = await currentUserInPage();
  if (user && can(user, 'user.changeRole')) {
    viewerId = user.id;
    data = await listMembersPage(page, PER_PAGE);
  }

  if (!data) {
    return <Refused title="Members and roles" message={REFUSAL['user.changeRole']} signedIn={true} />;
  }

  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Members and roles</h1>
      <p className="cw-muted font-sans text-sm">
        {`${data.total} members · page ${page} of ${data.totalPages}. A role change takes effect on the member’s next request, and they get a notice.`}
      </p>
      {data.members.length === 0 ? (
        <p className="cw-card font-sans">
          No members on this page.{' '}
          <Link href="/admin/users" className="cw-link">
            Go to the first page
          </Link>
          ; new members appear there as they sign up.
        </p>
      ) : (
        <div className="cw-card overflow-x-auto p-0">
          <table className="w-full font-sans text-sm">
            <thead>
              <tr className="border-b border-limestone-300 text-left dark:border-creek-600">
                <th scope="col" className="px-3 py-2">
                  Handle
                </th>
                <th scope="col" className="px-3 py-2">
                  Display name
                </th>
                <th scope="col" className="px-3 py-2">
                  Role
                </th>
              </tr>
            </thead>
            <tbody>
              {data.members.map((m) => (
                <tr key={m.id} className="border-b border-limestone-200 last:border-0 dark:border-creek-700">
                  <td className="px-3 py-2">
                    <Link href={`/people/${m.handle}`} className="cw-link">
                      @{m.handle}
                    </Link>
                  </td>
                  <td className="px-3 py-2">{m.displayName}</td>
                  <td className="px-3 py-2">
                    {m.id === viewerId ? (
                      <span title="Another admin can change your role">{m.role} (you)</span>
                    ) : (
                      <RolePicker userId={m.id} handle={m.handle} role={m.role} />
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {data.totalPages > 1 ? (
        <nav aria-label="Pages" className="flex gap-4 font-sans text-sm">
          {page > 1 ? (
            <Link href={`/admin/users?page=${page - 1}`} className="cw-link">
              ← Previous
            </Link>
          ) : null}
          {page < data.totalPages ? (
            <Link href={`/admin/users?page=${page + 1}`} className="cw-link">
              Next →
            </Link>
          ) : null}
        </nav>
      ) : null}
    </div>
  );
}
