/**
 * The bookkeeping columns of a versioned record of a workspace (a template, a build record),
 * joined with the names of its creator and last editor; the record's own fields come from its field table.
 */
export type VersionedRow = {
  id: number;
  workspace_id: number;
  version: number;
  created_by: number | null;
  updated_by: number | null;
  created_at: string;
  updated_at: string;
  created_by_name?: string | null;
  updated_by_name?: string | null;
};
