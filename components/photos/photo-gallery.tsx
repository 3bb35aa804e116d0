import { ActionButton } from '@/components/templates/template-actions';
import { PhotoUpload } from './photo-upload';

type Photo = { id: number; caption: string };

/**
 * The photos of a template or a build record: thumbnails linking to the full image, and for
 * someone who may edit (the page asks the policy) a delete button under each and the upload form.
 * `photosUrl` is the record's photo route; `altOf` ends an uncaptioned image's alt text ("of Trail 50"),
 * `removedFrom` names the record in the delete warning ("the record of Cora Vantwell").
 */
export function PhotoGallery({ photosUrl, photos, canEdit, altOf, removedFrom }: { photosUrl: string; photos: Photo[]; canEdit: boolean; altOf: string; removedFrom: string }) {
  return (
    <>
      {photos.length === 0 ? <p className="text-sm text-steel-600">No photos yet.</p> : null}
      <ul className="flex flex-wrap gap-4">
        {photos.map((photo) => (
          <li key={photo.id} className="space-y-1">
            <a href={`${photosUrl}/${photo.id}`}>
              {/* eslint-disable-next-line @next/next/no-img-element -- private, session-checked images */}
              <img src={`${photosUrl}/${photo.id}?size=thumb`} alt={photo.caption || `Photo ${photo.id} ${altOf}`} className="h-40 rounded border border-steel-200 object-contain" />
            </a>
            <p className="max-w-60 text-xs">{photo.caption}</p>
            {canEdit ? (
              <ActionButton
                url={`${photosUrl}/${photo.id}`}
                method="DELETE"
                label="Delete photo"
                busyLabel="Deleting…"
                confirm={{ title: 'Delete this photo?', message: `The photo is removed from ${removedFrom} for everyone in the workspace.`, confirmLabel: 'Delete photo', danger: true }}
              />
            ) : null}
          </li>
        ))}
      </ul>
      {canEdit ? <PhotoUpload url={photosUrl} /> : null}
    </>
  );
}
