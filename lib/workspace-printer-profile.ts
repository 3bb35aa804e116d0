import { printerProfileSchema } from './printer-profile';

/** What POST /api/v1/workspaces/[workspace]/printer-profiles takes: a browser profile without its local id and date. */
export const workspacePrinterProfileSchema = printerProfileSchema.pick({ name: true, printerScaleX: true, printerScaleY: true });
