import { listViewCodec } from '@/lib/lists/list-view';
import { templateListQuerySchema, type TemplateListQuery } from './list-query';

/** What the template list page keeps in its URL: `?q=&sort=&dir=&archived=&page=`, read with the API's list-query schema. */
export type TemplateListView = Pick<TemplateListQuery, 'q' | 'sort' | 'dir' | 'archived' | 'page'>;

const codec = listViewCodec<TemplateListView>(templateListQuerySchema.shape, ['q', 'sort', 'dir', 'archived', 'page']);

export const DEFAULT_LIST_VIEW = codec.defaults;
export const listViewFromParams = codec.fromParams;
export const listViewToParams = codec.toParams;
export const listViewHref = codec.href;
