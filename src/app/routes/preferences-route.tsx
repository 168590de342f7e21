import { roleLabels } from '../../../shared/permissions';
import { PreferencesForm } from '../../features/auth/components/preferences-form';
import { PageHeader } from '../../components/ui/page-header';
import { usePageTitle } from '../../lib/use-page-title';
import { useSessionUser } from '../session-user';

export function PreferencesRoute() {
  usePageTitle('My preferences');
  const user = useSessionUser();
  return (
    <>
      <PageHeader
        title="My preferences"
        description={`Signed in as ${user.email} (${roleLabels[user.role].toLowerCase()}). Only the owner can change your role or e-mail.`}
      />
      <PreferencesForm user={user} />
    </>
  );
}
