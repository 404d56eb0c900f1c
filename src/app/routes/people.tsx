import { useForm } from 'react-hook-form';
import { formResolver as zodResolver } from '../../lib/form-resolver';
import { useQuery } from '@tanstack/react-query';
import { peopleQueries, useInvite, useUpdatePerson } from '../../features/people/api/people';
import { ROLES, ROLE_LABELS, UserCreateSchema, type UserCreate } from '../../../shared/schemas/auth';
import { ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';
import { Field, inputClass } from '../../components/ui/field';
import { Button } from '../../components/ui/button';

export function Component() {
  const people = useQuery(peopleQueries.list());
  const invite = useInvite();
  const update = useUpdatePerson();
  const { register, handleSubmit, formState, reset } = useForm<UserCreate>({
    resolver: zodResolver(UserCreateSchema),
    defaultValues: { email: '', name: '', roles: ['designer'] },
  });
  return (
    <div>
      <PageHeader title="People" subtitle="Who works in this organisation, and what each may do" />
      <form
        onSubmit={handleSubmit((v) => invite.mutate(v, { onSuccess: () => reset() }))}
        noValidate
        className="mb-5 grid grid-cols-[1fr_1fr_auto_auto] items-end gap-3 rounded border border-line bg-panel p-4"
      >
        <Field label="Name" error={formState.errors.name?.message}>
          {(a) => <input {...a} {...register('name')} className={inputClass} />}
        </Field>
        <Field label="E-mail" error={formState.errors.email?.message}>
          {(a) => <input {...a} {...register('email')} className={inputClass} />}
        </Field>
        <fieldset className="flex gap-3 text-sm">
          <legend className="text-xs font-semibold uppercase text-ink-soft">Roles</legend>
          {ROLES.map((r) => (
            <label key={r} className="flex items-center gap-1">
              <input type="checkbox" value={r} {...register('roles')} /> {ROLE_LABELS[r]}
            </label>
          ))}
        </fieldset>
        <Button type="submit" disabled={invite.isPending}>
          Invite
        </Button>
        {formState.errors.roles ? <p className="col-span-4 text-xs text-state-returned">⚠ {formState.errors.roles.message}</p> : null}
        {invite.error ? (
          <div className="col-span-4">
            <ErrorNote error={invite.error} />
          </div>
        ) : null}
        {invite.data ? (
          <p className="col-span-4 text-sm">
            ✔ Invitation sent to {invite.data.email}. Link: <code>{invite.data.inviteLink}</code>
          </p>
        ) : null}
      </form>
      {update.error ? <ErrorNote error={update.error} /> : null}
      {people.isPending ? (
        <Loading />
      ) : people.isError ? (
        <ErrorNote error={people.error} />
      ) : (
        <table className="dense w-full rounded border border-line bg-panel text-sm" aria-label="People">
          <thead className="border-b border-line bg-surface text-left text-xs uppercase text-ink-soft">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th>E-mail</th>
              {ROLES.map((r) => (
                <th key={r} className="text-center">
                  {ROLE_LABELS[r]}
                </th>
              ))}
              <th>State</th>
              <th>Last sign-in</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {people.data.map((u) => (
              <tr key={u.id} className={`border-b border-line/60 ${u.active ? '' : 'opacity-60'}`}>
                <td className="px-3 py-2 font-semibold">{u.name}</td>
                <td>{u.email}</td>
                {ROLES.map((r) => (
                  <td key={r} className="text-center">
                    <input
                      type="checkbox"
                      aria-label={`${u.name} is ${ROLE_LABELS[r]}`}
                      checked={u.roles.includes(r)}
                      onChange={(e) => {
                        const roles = e.target.checked ? [...u.roles, r] : u.roles.filter((x) => x !== r);
                        if (roles.length) update.mutate({ id: u.id, version: u.version, roles });
                      }}
                    />
                  </td>
                ))}
                <td>{u.active ? (u.invited ? '◔ Invited' : '✔ Active') : '✖ Deactivated'}</td>
                <td className="text-ink-soft">{u.lastSignInAt ? new Date(u.lastSignInAt).toLocaleString() : '—'}</td>
                <td className="text-right">
                  <Button variant="ghost" onClick={() => update.mutate({ id: u.id, version: u.version, active: !u.active })}>
                    {u.active ? 'Deactivate' : 'Reactivate'}
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
