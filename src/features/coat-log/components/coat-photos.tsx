import type { Coat } from '../../../../shared/schemas/coat';
import { photoSubjectLabels, type CoatPhoto } from '../../../../shared/schemas/coat-photo';
import { Button } from '../../../components/ui/button';
import { useShopFormat } from '../../../api/settings/use-shop-format';
import { coatNameWords } from './coat-log-format';

interface CoatPhotosProps {
  coat: Coat;
  photos: CoatPhoto[];
  onOpen: (photo: CoatPhoto, coat: Coat) => void;
  /** Left out for someone who may not add photos. */
  onAdd?: (coat: Coat) => void;
  /** In a table row: no space above, a narrower button. */
  compact?: boolean;
}

/** Thumbnails of a coat's photos (and those of the versions it corrects); each opens full size. */
export function CoatPhotos({ coat, photos, onOpen, onAdd, compact = false }: CoatPhotosProps) {
  const name = coatNameWords(coat, useShopFormat());
  if (photos.length === 0 && !onAdd) return null;
  return (
    <div className={compact ? '' : 'mt-2'}>
      {photos.length > 0 && (
        <ul aria-label={`Photos of ${name}`} className="flex flex-wrap gap-2">
          {photos.map((photo) => (
            <li key={photo.id}>
              <button
                type="button"
                onClick={() => onOpen(photo, coat)}
                className="block size-16 overflow-hidden rounded-panel border border-maple-400 bg-maple-100 focus-visible:outline-3 focus-visible:outline-lacquer-600"
                aria-label={`Open photo: ${photoSubjectLabels[photo.subject]}${photo.caption ? `, ${photo.caption}` : ''}`}
              >
                <img src={photo.url} alt="" loading="lazy" className="size-full object-cover" />
              </button>
            </li>
          ))}
        </ul>
      )}
      {onAdd && (
        <Button variant="quiet" className={compact ? 'px-2!' : 'mt-1'} onClick={() => onAdd(coat)} aria-label={`Add a photo to ${name}`}>
          Add photo
        </Button>
      )}
    </div>
  );
}

/** One photo as large as the screen allows, with what it shows and who took it. */
export function PhotoView({ photo, when }: { photo: CoatPhoto; when: string }) {
  return (
    <figure>
      <img src={photo.url} alt={`${photoSubjectLabels[photo.subject]} on this coat${photo.caption ? `: ${photo.caption}` : ''}`} className="max-h-[65dvh] w-full rounded-panel bg-maple-100 object-contain" />
      <figcaption className="mt-2">
        <span className="font-semibold">{photoSubjectLabels[photo.subject]}</span>
        {photo.caption && <span>: {photo.caption}</span>}
        <span className="block text-maple-700">
          {photo.takenByName}, {when}
          {photo.coatId !== photo.shownWithCoatId && ' · taken before this coat was corrected'}
        </span>
        <a href={photo.url} target="_blank" rel="noreferrer" className="mt-1 inline-flex min-h-touch items-center font-semibold text-lacquer-800 underline underline-offset-4">
          Open full size
        </a>
      </figcaption>
    </figure>
  );
}
