/** Table names shared by migrations, seeds and queries. */
export const TABLES = {
  users: 'users',
  workspaces: 'workspaces',
  memberships: 'memberships',
  oneTimeTokens: 'one_time_tokens',
  invitations: 'invitations',
  auditLog: 'audit_log',
  printerProfiles: 'printer_profiles',
  templates: 'templates',
  templatePhotos: 'template_photos',
  templateRevisions: 'template_revisions',
  importReceipts: 'import_receipts',
  builds: 'builds',
  buildRevisions: 'build_revisions',
  buildSends: 'build_sends',
  buildPhotos: 'build_photos',
} as const;
