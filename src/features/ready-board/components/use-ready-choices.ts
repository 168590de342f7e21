import { useJobChoices, useRackChoices } from '../api/get-ready-choices';

/** Filter choices; while they load or if they fail, the filters offer "All" only and the board still works. */
export function useReadyChoices() {
  const jobs = useJobChoices();
  const racks = useRackChoices();
  return { jobs: jobs.data ?? [], racks: racks.data ?? [] };
}
