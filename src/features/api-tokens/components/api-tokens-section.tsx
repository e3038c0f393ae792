import { useState } from 'react';
import { API_TOKEN_DEFAULT_DAYS, type ApiToken, type ApiTokenScope, type CreatedApiToken } from '../../../../shared/schemas/api-token.ts';
import type { Me } from '../../../../shared/schemas/account.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, Input, Select } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatDate, formatDateTime } from '../../../lib/format.ts';
import { useApiTokens, useCreateApiToken, useRevokeApiToken } from '../api/api-tokens.ts';

async function copyToClipboard(text: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

/** The new token, shown this once: the server keeps only a hash of it. */
function FreshToken({ created, onDone }: { created: CreatedApiToken; onDone: () => void }) {
  const [copied, setCopied] = useState(false);
  return (
    <div role="status" className="mb-3 rounded border border-accent/40 bg-accent-wash/60 px-3 py-2">
      <p className="text-sm font-semibold text-accent-strong">
        New {created.apiToken.scope} token “{created.apiToken.name}” for {created.apiToken.workspaceName}
      </p>
      <div className="mt-1.5 flex gap-2">
        <input aria-label="New API token" readOnly value={created.token} onFocus={(e) => e.target.select()} className="figures h-8 min-w-0 flex-1 rounded-sm border border-rule-strong bg-paper-raised px-2 text-xs" />
        <Button size="sm" className="h-8" onClick={() => void copyToClipboard(created.token).then(setCopied)}>
          {copied ? 'Copied' : 'Copy token'}
        </Button>
      </div>
      <p className="mt-1.5 text-xs text-ink-soft">
        Copy it now: it is shown only this once. Keep it secret, like a password — anyone holding it acts as you in this workspace until {formatDate(created.apiToken.expiresAt)} or until you
        revoke it. Scripts send it in the header <code className="figures">Authorization: Bearer &lt;token&gt;</code>{' '}
        · <button type="button" className="text-accent underline" onClick={onDone}>
          Done
        </button>
      </p>
    </div>
  );
}

function TokenRow({ token, busy, onRevoke }: { token: ApiToken; busy: boolean; onRevoke: () => void }) {
  return (
    <tr className="border-b border-rule/60 last:border-0" aria-label={`Token ${token.name}`}>
      <td className="px-2 py-1.5 font-medium text-ink">{token.name}</td>
      <td className="px-2 py-1.5 text-ink-soft">{token.workspaceName}</td>
      <td className="px-2 py-1.5">
        <Tag tone={token.scope === 'write' ? 'accent' : 'plain'}>{token.scope}</Tag>
      </td>
      <td className="figures px-2 py-1.5 text-xs text-ink-soft">{formatDate(token.createdAt)}</td>
      <td className="figures px-2 py-1.5 text-xs text-ink-soft">{token.state === 'expired' ? <Tag tone="signal">expired</Tag> : formatDate(token.expiresAt)}</td>
      <td className="figures px-2 py-1.5 text-xs text-ink-soft">{token.lastUsedAt ? formatDateTime(token.lastUsedAt) : 'never'}</td>
      <td className="px-2 py-1.5 text-right">
        <Button size="sm" variant="danger" busy={busy} onClick={onRevoke} aria-label={`Revoke token ${token.name}`}>
          Revoke
        </Button>
      </td>
    </tr>
  );
}

const expiryChoices = [7, 30, API_TOKEN_DEFAULT_DAYS, 180, 365];

/**
 * Personal API tokens for scripts: one per workspace and purpose, read or write, with an expiry.
 * A token never does more than the person's current role in its workspace.
 */
export function ApiTokensSection({ memberships }: { memberships: Me['memberships'] }) {
  const tokens = useApiTokens();
  const create = useCreateApiToken();
  const revoke = useRevokeApiToken();
  const toast = useToast();
  const [name, setName] = useState('');
  const [workspaceId, setWorkspaceId] = useState(memberships[0]?.workspaceId ?? '');
  const [scope, setScope] = useState<ApiTokenScope>('read');
  const [days, setDays] = useState(API_TOKEN_DEFAULT_DAYS);
  const [created, setCreated] = useState<CreatedApiToken | null>(null);
  const [errors, setErrors] = useState<{ name?: string; scope?: string; form?: string }>({});

  const make = () => {
    setErrors({});
    if (!name.trim()) return setErrors({ name: 'Name the token after the script that will use it.' });
    create.mutate(
      { workspaceId, name: name.trim(), scope, expiresInDays: days },
      {
        onSuccess: (c) => {
          setCreated(c);
          setName('');
        },
        onError: (e) => setErrors({ name: e.fieldMessage('name'), scope: e.fieldMessage('scope'), form: e.fieldMessage('name') || e.fieldMessage('scope') ? undefined : e.message }),
      },
    );
  };

  return (
    <div>
      <p className="mb-3 max-w-prose text-sm text-ink-soft">
        Scripts can call the API with a token instead of signing in. A <strong>read</strong> token only reads; a <strong>write</strong> token may also change what your role allows. Either works in one
        workspace only and follows your role there.
      </p>
      {created && <FreshToken created={created} onDone={() => setCreated(null)} />}
      {memberships.length > 0 && !created && (
        <div className="mb-3 flex flex-wrap items-start gap-3">
          <Field label="Name" error={errors.name} className="w-56">
            <Input value={name} maxLength={80} placeholder="e.g. nightly sweep" onChange={(e) => setName(e.target.value)} />
          </Field>
          <Field label="Workspace" className="w-64">
            <Select value={workspaceId} onChange={(e) => setWorkspaceId(e.target.value)}>
              {memberships.map((m) => (
                <option key={m.workspaceId} value={m.workspaceId}>
                  {m.workspaceName}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Scope" error={errors.scope} className="w-36">
            <Select value={scope} onChange={(e) => setScope(e.target.value as ApiTokenScope)}>
              <option value="read">read</option>
              <option value="write">write</option>
            </Select>
          </Field>
          <Field label="Expires after" className="w-36">
            <Select value={String(days)} onChange={(e) => setDays(Number(e.target.value))}>
              {expiryChoices.map((d) => (
                <option key={d} value={d}>
                  {d === 365 ? '1 year' : `${d} days`}
                </option>
              ))}
            </Select>
          </Field>
          <Button variant="primary" className="mt-6" busy={create.isPending} onClick={make}>
            Create token
          </Button>
        </div>
      )}
      {errors.form && <Notice tone="danger">{errors.form}</Notice>}
      {tokens.isPending ? (
        <Loading what="tokens" />
      ) : tokens.isError ? (
        <Notice tone="danger">{tokens.error.message}</Notice>
      ) : tokens.data.tokens.length === 0 ? (
        <p className="text-sm text-ink-faint">No API tokens.</p>
      ) : (
        <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
          <table className="w-full text-sm" aria-label="API tokens">
            <thead>
              <tr className="border-b border-rule text-left text-xs text-ink-faint">
                <th className="px-2 py-1.5 font-medium">Name</th>
                <th className="px-2 py-1.5 font-medium">Workspace</th>
                <th className="px-2 py-1.5 font-medium">Scope</th>
                <th className="px-2 py-1.5 font-medium">Created</th>
                <th className="px-2 py-1.5 font-medium">Expires</th>
                <th className="px-2 py-1.5 font-medium">Last used</th>
                <th className="px-2 py-1.5" />
              </tr>
            </thead>
            <tbody>
              {tokens.data.tokens.map((tk) => (
                <TokenRow
                  key={tk.id}
                  token={tk}
                  busy={revoke.isPending && revoke.variables === tk.id}
                  onRevoke={() => revoke.mutate(tk.id, { onSuccess: () => toast.show(`Token “${tk.name}” revoked: it no longer works.`), onError: (e) => toast.show(e.message, 'danger') })}
                />
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
