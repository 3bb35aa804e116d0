import type { Template } from '@/lib/templates/template';
import type { BuildFields } from './build-fields';

/**
 * The figures a record starts from when it is built from a template: the engine's
 * geometry, rotation, specified advance and port targets, and which template version
 * they came from. Whatever the user types afterwards wins.
 */
export function templatePrefill(template: Template): Partial<BuildFields> {
  return {
    templateId: template.id,
    templateVersion: template.version,
    engineDescription: template.description || template.name,
    strokeMm: template.strokeMm,
    rodMm: template.rodMm,
    rotation: template.rotation,
    advanceDeg: template.staticAdvanceDeg,
    portTargets: template.portTargets,
  };
}
