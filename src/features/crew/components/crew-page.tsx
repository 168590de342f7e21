import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { roleLabels } from '../../../../shared/permissions';
import type { CrewStatus } from '../../../../shared/schemas/crew';
import { buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { StatusBadge } from '../../../components/ui/status-badge';
import { useCrew } from '../../../api/crew/get-crew';
import { crewLabel, crewTone } from './crew-format';

interface CrewPageProps {
  viewerId: number;
  /** The owner opens anyone's records; a lead only their own. */
  seesDetails: boolean;
  siteId?: number;
  siteSwitcher?: ReactNode;
}

const kinds = [
  ['fitTest', 'Face-fit test'],
  ['healthSurveillance', 'Health surveillance'],
  ['training', 'Training'],
] as const;

function PersonRow({ person, link }: { person: CrewStatus; link: boolean }) {
  return (
    <tr className="border-b border-maple-200 last:border-b-0">
      <th scope="row" className="px-3 py-2 text-left font-semibold">
        {link ? (
          <Link to={`/crew/${person.userId}`} className="text-lacquer-800 underline underline-offset-4">
            {person.name}
          </Link>
        ) : (
          person.name
        )}
        <span className="block text-sm font-normal text-maple-700">{roleLabels[person.role]}</span>
      </th>
      {kinds.map(([key, label]) => (
        <td key={key} className="px-3 py-2" aria-label={`${label}: ${crewLabel(person[key])}`}>
          <StatusBadge tone={crewTone[person[key]]}>{crewLabel(person[key])}</StatusBadge>
        </td>
      ))}
    </tr>
  );
}

/** The crew's protection records as a status per person: valid, due soon, lapsed or none recorded. */
export function CrewPage({ viewerId, seesDetails, siteId, siteSwitcher }: CrewPageProps) {
  const crew = useCrew(siteId);
  return (
    <>
      <PageHeader
        title="Crew records"
        description={
          seesDetails
            ? 'Face-fit tests, health surveillance for isocyanate work and training. Open a person to see or add their records.'
            : 'Each person’s face-fit test, health surveillance and training as a status only; the details are theirs and the owner’s.'
        }
        actions={
          <>
            {siteSwitcher}
            <Link to={`/crew/${viewerId}`} className={buttonClasses('secondary')}>
              My own records
            </Link>
          </>
        }
      />
      {crew.isPending ? (
        <LoadingState what="the crew" />
      ) : crew.isError ? (
        <ErrorState error={crew.error} what="the crew" onRetry={() => crew.refetch()} />
      ) : crew.data.length === 0 ? (
        <EmptyState title="No sprayers yet">Sprayers and leads appear here once they are added under Users.</EmptyState>
      ) : (
        <div role="region" aria-label="Crew status" tabIndex={0} className="overflow-x-auto rounded-panel border border-maple-300 bg-white">
          <table className="w-full border-collapse">
            <caption className="sr-only">Each person’s records as a status</caption>
            <thead className="bg-maple-100">
              <tr>
                {['Person', ...kinds.map(([, label]) => label)].map((heading) => (
                  <th key={heading} scope="col" className="border-b border-maple-300 px-3 py-2 text-left text-sm font-semibold text-maple-800">
                    {heading}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {crew.data.map((person) => (
                <PersonRow key={person.userId} person={person} link={seesDetails || person.userId === viewerId} />
              ))}
            </tbody>
          </table>
        </div>
      )}
      <p className="mt-4 max-w-3xl text-sm text-maple-700">
        Health surveillance matters for anyone who sprays isocyanate products; a face-fit test for anyone who wears a tight-fitting respirator. Follow your local regulations and the advice of a competent person.
      </p>
    </>
  );
}
