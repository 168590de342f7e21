import { useWriteQueueSender } from '../hooks/use-pending-writes';

/** Sends the writes waiting on this tablet whatever page is open; renders nothing. */
export function WriteQueueSender() {
  useWriteQueueSender();
  return null;
}
