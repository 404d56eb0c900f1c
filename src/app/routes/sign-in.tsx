import { useForm } from 'react-hook-form';
import { formResolver as zodResolver } from '../../lib/form-resolver';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { SignInSchema, type SignIn } from '../../../shared/schemas/auth';
import { useSignIn } from '../../features/auth/api/session';
import { Field, inputClass } from '../../components/ui/field';
import { Button } from '../../components/ui/button';
import { ErrorNote } from '../../components/ui/feedback';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const signIn = useSignIn();
  const { register, handleSubmit, formState } = useForm<SignIn>({
    resolver: zodResolver(SignInSchema),
    defaultValues: { email: '', password: '' },
  });
  const onSubmit = handleSubmit((values) =>
    signIn.mutate(values, {
      onSuccess: () => {
        const next = params.get('next');
        navigate(next?.startsWith('/') && !next.startsWith('//') ? next : '/jobs', { replace: true });
      },
    }),
  );
  return (
    <div className="grid min-h-screen place-items-center bg-header px-4">
      <div className="w-full max-w-sm">
        <div className="mb-6 text-center text-header-ink">
          <p className="text-3xl font-bold tracking-wide">Panelwright</p>
          <p className="text-sm text-header-ink/70">Motor-control panels, from motor list to signed-off revision</p>
        </div>
        <form onSubmit={onSubmit} noValidate className="space-y-4 rounded-md border-t-4 border-copper-500 bg-panel p-6 shadow-lg">
          <h1 className="text-xl font-semibold">Sign in</h1>
          <Field label="E-mail" error={formState.errors.email?.message}>
            {(p) => <input {...p} {...register('email')} type="email" autoComplete="username" className={inputClass} autoFocus />}
          </Field>
          <Field label="Password" error={formState.errors.password?.message}>
            {(p) => <input {...p} {...register('password')} type="password" autoComplete="current-password" className={inputClass} />}
          </Field>
          {signIn.error ? <ErrorNote error={signIn.error} /> : null}
          <Button type="submit" className="w-full justify-center" disabled={signIn.isPending}>
            {signIn.isPending ? 'Signing in…' : 'Sign in'}
          </Button>
        </form>
      </div>
    </div>
  );
}
