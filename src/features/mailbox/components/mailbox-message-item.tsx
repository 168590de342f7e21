import type { MailboxMessage } from '../../../../shared/schemas/notification';
import { formatShopDateTime, shopZoneName } from '../../../lib/shop-time';

/** One caught e-mail: the summary line always shows; the text opens on demand. */
export function MailboxMessageItem({ message, timeZone }: { message: MailboxMessage; timeZone: string }) {
  const received = `${formatShopDateTime(message.receivedAt, timeZone)} ${shopZoneName(new Date(message.receivedAt), timeZone)}`;
  return (
    <li>
      <details className="group">
        <summary className="flex min-h-touch cursor-pointer list-none items-start gap-3 px-4 py-3 hover:bg-maple-50">
          <span aria-hidden="true" className="mt-0.5 text-maple-700 group-open:rotate-90">
            ▸
          </span>
          <span className="min-w-0 flex-1">
            <span className="block font-medium break-words">{message.subject || '(no subject)'}</span>
            <span className="mt-0.5 flex flex-wrap gap-x-5 text-sm text-maple-700">
              <span>Received {received}</span>
              <span className="break-all">To {message.to}</span>
            </span>
          </span>
        </summary>
        <div className="border-t border-maple-200 bg-maple-50 px-4 py-3">
          <p className="mb-2 text-sm text-maple-700">From {message.from}</p>
          <pre className="font-sans text-base break-words whitespace-pre-wrap">{message.text || '(no text)'}</pre>
        </div>
      </details>
    </li>
  );
}
