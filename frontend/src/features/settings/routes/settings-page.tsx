import { useSuspenseQuery } from '@tanstack/react-query';

import { PageHeader } from '../../../components/ui/page-header';
import { useToast } from '../../../components/ui/use-toast';
import { settingsQueryOptions } from '../api/get-settings';
import { LabSettingsForm } from '../components/lab-settings-form';

export function SettingsPage() {
  const { data } = useSuspenseQuery(settingsQueryOptions());
  const toast = useToast();

  return (
    <>
      <PageHeader title="Lab settings" description="These apply to everyone in the lab." />
      <LabSettingsForm settings={data} onSaved={() => toast.show('Lab settings saved.')} />
    </>
  );
}
