import { formatMoment } from '@shared/format/dates';
import { useState } from 'react';
import { roleLabels, roles, type Role } from '@shared/workflow/statuses';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { Field, SelectInput, TextInput } from '@/components/ui/field';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { PersonName } from './person-name';

export function UsersTable() {
  const [search, setSearch] = useState('');
  const [role, setRole] = useState<Role | ''>('');
  const users = useUsers({ search: search || undefined, role: role || undefined });
  const update = useUpdateUser();
  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Search by name or e-mail">
          {({ id }) => <TextInput id={id} value={search} onChange={(e) => setSearch(e.target.value)} />}
        </Field>
        <Field label="Role">
          {({ id }) => (
            <SelectInput id={id} value={role} onChange={(e) => setRole(e.target.value as Role | '')}>
              <option value="">All roles</option>
              {roles.map((r) => (
                <option key={r} value={r}>
                  {roleLabels[r]}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
      </div>
      <ErrorNotice error={users.error ?? update.error} />
      {users.isPending ? (
        <Loading />
      ) : (
        <ScrollRegion label="People">
          <table className="w-full text-left text-sm">
            <thead className="border-b border-stone-300 text-stone-600">
              <tr>
                <th className="py-2 pr-3">Name</th>
                <th className="pr-3">E-mail</th>
                <th className="pr-3">Role</th>
                <th className="pr-3">Access</th>
                <th>Last sign-in</th>
              </tr>
            </thead>
            <tbody>
              {users.data?.users.map((user) => (
                <tr key={user.id} className="border-b border-stone-100">
                  <td className="py-2 pr-3">
                    <PersonName id={user.id} name={user.name} />
                  </td>
                  <td className="pr-3">{user.email}</td>
                  <td className="pr-3">
                    <label className="sr-only" htmlFor={`role-${user.id}`}>
                      Role for {user.name}
                    </label>
                    <select
                      id={`role-${user.id}`}
                      className="rounded border border-stone-300 px-2 py-1"
                      value={user.role}
                      onChange={(e) => update.mutate({ id: user.id, role: e.target.value as Role })}
                    >
                      {roles.map((r) => (
                        <option key={r} value={r}>
                          {roleLabels[r]}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td className="pr-3">
                    <label className="inline-flex items-center gap-2">
                      <input
                        type="checkbox"
                        checked={!user.disabled}
                        onChange={(e) => update.mutate({ id: user.id, disabled: !e.target.checked })}
                      />
                      {user.disabled ? 'Turned off' : 'Can sign in'}
                    </label>
                  </td>
                  <td>{formatMoment(user.lastSignInAt, { missing: 'Never' })}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}
    </div>
  );
}
