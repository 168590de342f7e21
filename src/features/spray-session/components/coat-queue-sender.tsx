import { useCoatQueueSender } from '../hooks/use-pending-coats';

/** Sends coats waiting on this tablet whatever page is open; renders nothing. */
export function CoatQueueSender() {
  useCoatQueueSender();
  return null;
}
