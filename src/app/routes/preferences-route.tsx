import { roleLabels } from '../../../shared/permissions';
import { PreferencesForm } from '../../features/auth/components/preferences-form';
import { PageHeader } from '../../components/ui/page-header';
import { usePageTitle } from '../../lib/use-page-title';
import { useSignedInUser } from '../signed-in-user';

export function PreferencesRoute() {
  usePageTitle('My preferences');
  const user = useSignedInUser();
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
