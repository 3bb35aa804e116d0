import 'server-only';
import { photoStore, type StoredPhotoOf } from '@/db/photo-store';
import { TABLES } from '@/db/tables';
import type { TemplatePhoto } from '@/lib/templates/template';

export type StoredPhoto = StoredPhotoOf<'templateId'>;

const store = photoStore(TABLES.templatePhotos, 'template_id', 'templateId');

export const publicPhoto = (photo: StoredPhoto): TemplatePhoto => store.toPublic(photo);
export const listPhotos = store.list;
export const findPhoto = store.find;
export const insertPhoto = store.insert;
export const deletePhotoRow = store.deleteRow;
