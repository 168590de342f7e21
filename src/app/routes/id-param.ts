import { useParams } from 'react-router-dom';

/** The route's numeric id, or null when the address holds something else. */
export function useIdParam(name = 'id'): number | null {
  const value = Number(useParams()[name]);
  return Number.isInteger(value) && value > 0 ? value : null;
}
