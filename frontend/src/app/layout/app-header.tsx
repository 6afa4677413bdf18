import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';

import { ROLE_LABELS, type SessionUser } from '@tracewright/shared';

import { Icon } from '../../components/icons/icon';
import { Button } from '../../components/ui/button';
import { buttonClasses } from '../../components/ui/button-styles';
import { useToast } from '../../components/ui/use-toast';
import { useSignOut } from '../../features/auth/api/sign-out';
import { settingsQueryOptions } from '../../features/settings/api/get-settings';
import { BrandMark } from './brand-mark';

export function AppHeader({ user }: { user: SessionUser }) {
  // The lab name is a courtesy: if settings cannot load, the product name stands in.
  const settings = useQuery(settingsQueryOptions());
  const signOut = useSignOut();
  const toast = useToast();

  return (
    <header className="flex flex-wrap items-center justify-between gap-4 border-b border-graphite-200 bg-white px-4 py-3 md:col-span-2">
      <div className="flex items-center gap-3">
        <BrandMark />
        <div>
          <p className="text-lg font-bold leading-tight">{settings.data?.labName ?? 'Tracewright'}</p>
          <p className="text-sm text-graphite-600">Tracewright</p>
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-right leading-tight">
          <span className="block font-bold">{user.name}</span>
          <span className="block text-sm text-graphite-600">{ROLE_LABELS[user.role].name}</span>
        </p>
        <Link to="/pin" className={buttonClasses('secondary')}>
          <Icon name="swap" />
          Switch person
        </Link>
        <Button
          variant="secondary"
          isPending={signOut.isPending}
          pendingLabel="Signing out…"
          onClick={() => signOut.mutate(undefined, { onError: (error) => toast.show(error.message, 'blocked') })}
        >
          <Icon name="exit" />
          Sign out
        </Button>
      </div>
    </header>
  );
}
