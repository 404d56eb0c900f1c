import { useForm } from 'react-hook-form';
import { formResolver as zodResolver } from '../../lib/form-resolver';
import { useMutation } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import type { z } from 'zod';
import { AcceptInviteSchema } from '../../../shared/schemas/auth';
import { post } from '../../lib/api-client';
import { Field, inputClass } from '../../components/ui/field';
import { Button } from '../../components/ui/button';
import { ErrorNote } from '../../components/ui/feedback';

type Values = z.infer<typeof AcceptInviteSchema>;

export function Component() {
  const { token = '' } = useParams();
  const accept = useMutation({ mutationFn: (v: Values) => post<{ email: string }>('/api/auth/accept-invite', v) });
  const { register, handleSubmit, formState } = useForm<Values>({
    resolver: zodResolver(AcceptInviteSchema),
    defaultValues: { token, password: '' },
  });
  return (
    <div className="grid min-h-screen place-items-center bg-header px-4">
      <form
        onSubmit={handleSubmit((v) => accept.mutate(v))}
        noValidate
        className="w-full max-w-sm space-y-4 rounded-md border-t-4 border-copper-500 bg-panel p-6"
      >
        <h1 className="text-xl font-semibold">Set your password</h1>
        {accept.isSuccess ? (
          <p className="text-sm">
            ✔ Password set for {accept.data.email}.{' '}
            <Link className="font-semibold text-copper-700 underline" to="/sign-in">
              Sign in
            </Link>
          </p>
        ) : (
          <>
            <input type="hidden" {...register('token')} />
            <Field
              label="New password"
              hint="At least 12 characters, letters mixed with digits or symbols"
              error={formState.errors.password?.message}
            >
              {(p) => <input {...p} {...register('password')} type="password" autoComplete="new-password" className={inputClass} />}
            </Field>
            {accept.error ? <ErrorNote error={accept.error} /> : null}
            <Button type="submit" disabled={accept.isPending}>
              Set password
            </Button>
          </>
        )}
      </form>
    </div>
  );
}
