import 'server-only';
import { photoStore, type StoredPhotoOf } from '@/db/photo-store';
import { TABLES } from '@/db/tables';
import type { BuildPhoto } from '@/lib/builds/build';

export type StoredBuildPhoto = StoredPhotoOf<'buildId'>;

const store = photoStore(TABLES.buildPhotos, 'build_id', 'buildId');

export const publicBuildPhoto = (photo: StoredBuildPhoto): BuildPhoto => store.toPublic(photo);
export const listBuildPhotos = store.list;
export const findBuildPhoto = store.find;
export const insertBuildPhoto = store.insert;
export const deleteBuildPhotoRow = store.deleteRow;
