import type { Part } from '../../../../shared/schemas/part';
import { facesWords, partSize, spacedTag } from './part-format';

interface RackTagProps {
  part: Part;
  jobReference: string;
  customer: string;
  qrSrc: string;
}

/**
 * One label, 60 × 40 mm: three fit across A4 and US Letter inside 10 mm margins. The tag code
 * is printed large for typing in when a camera cannot read the QR code.
 */
export function RackTag({ part, jobReference, customer, qrSrc }: RackTagProps) {
  return (
    <li className="flex h-[40mm] w-[60mm] break-inside-avoid gap-[2mm] overflow-hidden rounded-[2mm] border border-dashed border-maple-500 bg-white p-[2mm] text-black">
      <div className="flex w-[24mm] shrink-0 flex-col items-center">
        <img src={qrSrc} alt={`QR code for part ${part.label}`} className="size-[24mm]" />
        <span className="mt-[1mm] text-center text-[6pt] leading-tight">Scan to open the part</span>
      </div>
      <div className="flex min-w-0 flex-1 flex-col text-[7.5pt] leading-tight">
        <p className="truncate font-semibold">{jobReference}</p>
        <p className="truncate">{customer}</p>
        <p className="mt-[1mm] line-clamp-2 text-[9pt] font-bold leading-tight">{part.label}</p>
        <p className="truncate">{partSize(part)}{part.quantity > 1 ? ` × ${part.quantity}` : ''}</p>
        <p className="truncate text-[6.5pt]">{facesWords(part)}</p>
        <p className="mt-auto whitespace-nowrap font-mono text-[12pt] font-bold tracking-wider" aria-label={`Tag ${part.tag.split('').join(' ')}`}>
          {spacedTag(part.tag)}
        </p>
      </div>
    </li>
  );
}
