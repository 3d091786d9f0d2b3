import type { Material } from '@tumblewise/shared';

/** The filters above the material table. */
export interface MaterialFilter {
  /** Text to find in the name or the source. */
  text: string;
  /** '' for every family. */
  family: Material['family'] | '';
  /** '' for both the library and the workspace's own. */
  scope: Material['scope'] | '';
}

/** Whether a material passes the filters (text ignores case). */
export function materialMatchesFilter(material: Material, filter: MaterialFilter): boolean {
  if (filter.family && material.family !== filter.family) return false;
  if (filter.scope && material.scope !== filter.scope) return false;
  const needle = filter.text.trim().toLowerCase();
  return !needle || material.name.toLowerCase().includes(needle) || material.source.toLowerCase().includes(needle);
}

/** The value a column sorts by: text without case, numbers as numbers. */
export function materialSortValue(material: Material, column: string): string | number {
  switch (column) {
    case 'name':
      return material.name.toLocaleLowerCase();
    case 'family':
      return material.family;
    case 'density':
      return material.density;
    case 'tolerance':
      return material.densityTolerance;
    case 'source':
      return material.source.toLocaleLowerCase();
    case 'scope':
      return material.scope;
    default:
      return '';
  }
}
