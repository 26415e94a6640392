import type { Material, MemberSize } from './types';

/** Which size of which material a result is about: ids, labels and the section's plies and dimensions. */
export interface SizeIdentity {
  materialId: string;
  materialLabel: string;
  sizeId: string;
  sizeLabel: string;
  plies: number;
  /** Overall width (all plies), in. */
  bIn: number;
  /** Depth, in. */
  dIn: number;
}

/**
 * The identity fields a member check result and a shortlist entry both carry.
 * @param material the material (from getMaterial)
 * @param size one of its sizes (from listSizes or getSize); b and d in in
 * @returns ids, labels, plies, b and d (in)
 * @example sizeIdentity(getMaterial('lvl-2.0e'), getSize('lvl-2.0e', '2-ply-1.75x11.875')).bIn; // 3.5
 * Reference: NDS Supplement 2018 Table 1B (dressed sizes); generic LVL sizes.
 */
export function sizeIdentity(material: Material, size: MemberSize): SizeIdentity {
  return {
    materialId: material.id,
    materialLabel: material.label,
    sizeId: size.id,
    sizeLabel: size.label,
    plies: size.plies,
    bIn: size.bIn,
    dIn: size.dIn,
  };
}
