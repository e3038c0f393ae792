import type { DemoUser } from '../../../../shared/schemas/config.ts';
import { Tag } from '../../../components/ui/tag.tsx';

/** The demo accounts (demo mode only): who they are, their role, and a button that fills the form. */
export function DemoUsers({ users, onPick }: { users: DemoUser[]; onPick: (user: DemoUser) => void }) {
  if (users.length === 0) return null;
  return (
    <section aria-labelledby="demo-heading" className="rounded border border-rule bg-paper-sunk/60 p-3">
      <h2 id="demo-heading" className="text-sm font-semibold text-ink">
        Demo accounts
      </h2>
      <p className="mb-2 text-xs text-ink-soft">
        This server runs in demo mode. Every account below uses the password <code className="figures text-ink">{users[0]?.password}</code>.
      </p>
      <ul className="divide-y divide-rule/80">
        {users.map((user) => (
          <li key={user.email} className="flex items-center gap-3 py-1.5">
            <div className="min-w-0 flex-1">
              <p className="text-sm font-medium">{user.name}</p>
              <p className="truncate text-xs text-ink-faint">{user.email}</p>
            </div>
            <Tag tone={user.role === 'viewer' ? 'plain' : 'accent'}>{user.role}</Tag>
            <button
              type="button"
              onClick={() => onPick(user)}
              className="h-7 rounded px-2 text-sm font-medium text-accent hover:bg-accent-wash"
              aria-label={`Fill in ${user.name} (${user.role})`}
            >
              Fill in
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
