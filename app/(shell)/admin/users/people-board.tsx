'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import { useState } from 'react';
import { ROLE_LABELS, ROLES, type Role } from '@/lib/roles';
import type { UserDto } from '@/lib/contracts/users';
import { apiFetch } from '../../../_components/api-client';
import { ConfirmBar, type PendingConfirm } from '../../../_components/confirm-bar';
import { DataGrid } from '../../../_components/data-grid';
import { InviteForm } from './invite-form';

const STATUS_STYLE: Record<UserDto['status'], string> = {
  active: 'bg-ok-light text-ok',
  invited: 'bg-brass-light text-brass-dark',
  inactive: 'bg-paper-deep text-ink-faint',
};

export function PeopleBoard({ initialUsers, meId }: { initialUsers: UserDto[]; meId: number }) {
  const [users, setUsers] = useState(initialUsers);
  const [filter, setFilter] = useState('');
  const [notice, setNotice] = useState<string | null>(null);
  const [pending, setPending] = useState<PendingConfirm | null>(null);

  const replace = (u: UserDto) => setUsers((list) => list.map((x) => (x.id === u.id ? u : x)));

  async function patch(user: UserDto, change: { role?: Role; active?: boolean }) {
    const res = await apiFetch<{ user: UserDto }>(`/api/v1/users/${user.id}`, { method: 'PATCH', body: { ...change, version: user.version } });
    if (res.ok) {
      replace(res.data.user);
      setNotice(`${res.data.user.name}: saved.`);
    } else if (res.code === 'stale_version') {
      // Changed meanwhile (an invitation accepted, another admin): show it as it is now, change nothing.
      const fresh = await apiFetch<{ users: UserDto[] }>('/api/v1/users');
      if (fresh.ok) setUsers(fresh.data.users);
      setNotice(`${user.name} was changed meanwhile, so nothing was saved. The list now shows them as they are; make the change again if it still applies.`);
    } else setNotice(res.message);
  }

  async function signOutEverywhere(user: UserDto) {
    const res = await apiFetch<{ ended: number }>(`/api/v1/users/${user.id}/sessions`, { method: 'DELETE' });
    setNotice(res.ok ? `${user.name} is signed out on ${res.data.ended === 1 ? '1 device' : `${res.data.ended} devices`}.` : res.message);
  }

  async function sendLink(user: UserDto) {
    const res = await apiFetch<{ mail: string; kind: 'invitation' | 'password_reset' }>(`/api/v1/users/${user.id}/invitation`, { method: 'POST' });
    if (!res.ok) return setNotice(res.message);
    const what = res.data.kind === 'password_reset' ? 'A password reset link' : 'A new invitation';
    setNotice(
      res.data.mail === 'sent'
        ? `${what} went to ${user.email}; only they can open it.`
        : `${what} for ${user.email} could not be sent (${res.data.mail}); see the outbox.`,
    );
  }

  // Making someone an administrator gives them every permission: asked first. Other roles change at once.
  function changeRole(user: UserDto, role: Role) {
    if (role !== 'admin') return void patch(user, { role });
    setPending({
      question: `Make ${user.name} an administrator? They will manage people, scales and site settings, and can act as any role.`,
      yes: 'Yes, make administrator',
      onConfirm: () => patch(user, { role }),
    });
  }

  const columns: ColDef<UserDto>[] = [
    { field: 'name', headerName: 'Name', minWidth: 160 },
    { field: 'email', headerName: 'E-mail', minWidth: 220 },
    {
      field: 'role',
      headerName: 'Role',
      minWidth: 200,
      cellRenderer: (p: ICellRendererParams<UserDto>) =>
        p.data && p.data.id !== meId ? (
          <select
            aria-label={`Role of ${p.data.name}`}
            className="field py-0"
            value={p.data.role}
            onChange={(e) => changeRole(p.data!, e.target.value as Role)}
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        ) : (
          <span>{p.data ? ROLE_LABELS[p.data.role] : ''} (you)</span>
        ),
    },
    {
      field: 'status',
      headerName: 'Status',
      maxWidth: 140,
      cellRenderer: (p: ICellRendererParams<UserDto>) =>
        p.data ? <span className={`rounded px-2 py-1 text-sm ${STATUS_STYLE[p.data.status]}`}>{p.data.status}</span> : null,
    },
    {
      headerName: 'Actions',
      sortable: false,
      filter: false,
      minWidth: 440,
      cellRenderer: (p: ICellRendererParams<UserDto>) => {
        const u = p.data;
        if (!u || u.id === meId) return null;
        return (
          <span className="flex gap-2 items-center h-full">
            {u.active ? (
              <button
                type="button"
                className="text-fault hover:underline"
                onClick={() =>
                  setPending({
                    question: `Switch off ${u.name}? They can no longer sign in until someone switches them on again; what they recorded stays.`,
                    yes: 'Yes, switch off',
                    onConfirm: () => patch(u, { active: false }),
                  })
                }
              >
                Switch off
              </button>
            ) : (
              <button type="button" className="text-forge hover:underline" onClick={() => patch(u, { active: true })}>
                Switch on
              </button>
            )}
            {u.status === 'active' ? (
              <button
                type="button"
                className="text-forge hover:underline"
                onClick={() =>
                  setPending({
                    question: `Sign ${u.name} out on every device? Whatever they are doing unsaved is lost; they can sign in again.`,
                    yes: 'Yes, sign out everywhere',
                    onConfirm: () => signOutEverywhere(u),
                  })
                }
              >
                Sign out everywhere
              </button>
            ) : null}
            {u.status === 'invited' ? (
              <button type="button" className="text-forge hover:underline" onClick={() => sendLink(u)}>
                Send link again
              </button>
            ) : null}
            {u.status === 'active' ? (
              <button
                type="button"
                className="text-forge hover:underline"
                onClick={() =>
                  setPending({
                    question: `Mail ${u.name} a link to choose a new password? Their current password keeps working until they use it.`,
                    yes: 'Yes, send the link',
                    onConfirm: () => sendLink(u),
                  })
                }
              >
                Reset password
              </button>
            ) : null}
          </span>
        );
      },
    },
  ];

  return (
    <div className="space-y-4">
      <InviteForm
        onInvited={(user, mail) => {
          setUsers((list) => [...list, user].sort((a, b) => a.name.localeCompare(b.name)));
          setNotice(mail === 'sent' ? `Invitation sent to ${user.email}.` : `${user.name} was added, but the e-mail failed; send the link again.`);
        }}
      />
      <ConfirmBar pending={pending} onDone={() => setPending(null)} />
      <p role="status" aria-live="polite" className="min-h-6 text-sm text-ink-soft" data-testid="people-notice">
        {notice}
      </p>
      <div className="flex items-center gap-3">
        <label htmlFor="people-filter" className="text-sm text-ink-soft">
          Find
        </label>
        <input id="people-filter" className="field max-w-xs" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Name, e-mail or role" />
      </div>
      <DataGrid label="People" rows={users} columns={columns} rowId={(u) => String(u.id)} quickFilter={filter} />
    </div>
  );
}
