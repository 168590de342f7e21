import { useCoats } from '../../../api/coats/get-coats';
import { useDenibs } from '../../../api/denibs/get-denibs';

// A session records tens of coats and denibs, not hundreds: one page holds them.
const sessionPage = { pageSize: 200 };

/** The session's current coat records, newest first. */
export function useSessionCoats(spraySessionId: number) {
  return useCoats({ spraySessionId, ...sessionPage });
}

/** The denibs recorded on the session, newest first. */
export function useSessionDenibs(spraySessionId: number) {
  return useDenibs({ spraySessionId, ...sessionPage });
}

/** Both, as the session page reads them. */
export function useSessionRecords(spraySessionId: number) {
  return { coats: useSessionCoats(spraySessionId), denibs: useSessionDenibs(spraySessionId) };
}
