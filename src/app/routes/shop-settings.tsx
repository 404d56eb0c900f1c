import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { settingsQueries } from '../../features/settings/api/settings';
import { hasRole, sessionQueries } from '../../features/auth/api/session';
import { LogoSection, SettingsForm } from '../../features/settings/components/shop-settings-form';
import { ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';

export function Component() {
  const { data: me } = useQuery(sessionQueries.me());
  const settings = useQuery(settingsQueries.shop());
  const [base, setBase] = useState<number | null>(null);
  if (!hasRole(me, 'admin')) {
    return (
      <div>
        <PageHeader title="Shop settings" />
        <p className="text-sm text-ink-soft">Only a shop administrator changes the shop settings.</p>
      </div>
    );
  }
  return (
    <div className="max-w-4xl">
      <PageHeader
        title="Shop settings"
        subtitle="The shop's name, address and logo on every submittal, the pricing a new panel starts with, drawing numbers and the sign-off rule"
      />
      {settings.isPending ? (
        <Loading />
      ) : settings.isError ? (
        <ErrorNote error={settings.error} />
      ) : (
        <div className="space-y-5">
          <SettingsForm settings={settings.data} base={base ?? settings.data.version} setBase={setBase} />
          <LogoSection settings={settings.data} moved={(from, to) => setBase((b) => ((b ?? from) === from ? to : b))} />
        </div>
      )}
    </div>
  );
}
