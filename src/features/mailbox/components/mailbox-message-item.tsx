import type { MailboxMessage } from '../../../../shared/schemas/notification';
import { formatShopDateTime, shopZoneName } from '../../../lib/shop-time';

/** One caught e-mail: the summary line always shows; the text opens on demand. */
export function MailboxMessageItem({ message, timeZone }: { message: MailboxMessage; timeZone: string }) {
  const received = `${formatShopDateTime(message.receivedAt, timeZone)} ${shopZoneName(new Date(message.receivedAt), timeZone)}`;
  return (
    <li>
      <details className="group">
        <summary className="flex min-h-touch cursor-pointer list-none flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 hover:bg-maple-50">
          <span aria-hidden="true" className="text-maple-700 group-open:rotate-90">
            ▸
          </span>
          <span className="w-44 shrink-0 text-sm text-maple-700">
            <span className="sr-only">Received </span>
            {received}
          </span>
          <span className="w-56 shrink-0 truncate text-sm">
            <span className="text-maple-700">To </span>
            {message.to}
          </span>
          <span className="min-w-0 flex-1 font-medium break-words">{message.subject || '(no subject)'}</span>
        </summary>
        <div className="border-t border-maple-200 bg-maple-50 px-4 py-3">
          <p className="mb-2 text-sm text-maple-700">From {message.from}</p>
          <pre className="font-sans text-base break-words whitespace-pre-wrap">{message.text || '(no text)'}</pre>
        </div>
      </details>
    </li>
  );
}
