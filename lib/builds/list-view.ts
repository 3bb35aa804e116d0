import { listViewCodec } from '@/lib/lists/list-view';
import { buildListQuerySchema, type BuildListQuery } from './list-query';

/** What the build list page keeps in its URL: `?q=&status=&technician=&template=&sort=&dir=&page=` (also the API's query). */
export type BuildListView = Pick<BuildListQuery, 'q' | 'status' | 'technician' | 'template' | 'sort' | 'dir' | 'page'>;

const codec = listViewCodec<BuildListView>(buildListQuerySchema.shape, ['q', 'status', 'technician', 'template', 'sort', 'dir', 'page']);

export const buildListViewFromParams = codec.fromParams;
export const buildListViewToParams = codec.toParams;
export const buildListViewHref = codec.href;
