/**
 * Thickness of a 2x plate, sill or jack stud (dressed size of nominal 2 in lumber), in.
 * @example PLATE_THICKNESS_IN // 1.5
 * Reference: NDS Supplement (2018) Table 1B dressed sizes; common practice.
 */
export const PLATE_THICKNESS_IN = 1.5;

/**
 * Precut stud lengths sold for standard walls, in: 92-5/8 for an 8 ft wall (with a bottom plate and a double
 * top plate it gives a 97-1/8 in plate height), 104-5/8 for a 9 ft wall.
 * @example PRECUT_STUDS[0].lengthIn // 92.625
 * Reference: common practice (lumber yard stock).
 */
export const PRECUT_STUDS: readonly { lengthIn: number; label: string }[] = Object.freeze([
  { lengthIn: 92.625, label: '92-5/8 in precut stud' },
  { lengthIn: 104.625, label: '104-5/8 in precut stud' },
]);

/**
 * Stock lengths of sawn dimension lumber, ft.
 * @example STOCK_LENGTHS_FT[0] // 8
 * Reference: common practice (lumber yard stock, even lengths 8 to 20 ft).
 */
export const STOCK_LENGTHS_FT: readonly number[] = Object.freeze([8, 10, 12, 14, 16, 18, 20]);

/**
 * Width lost to each saw cut when several pieces come out of one stock length, in.
 * @example SAW_KERF_IN // 0.125
 * Reference: common practice (circular saw blade kerf about 1/8 in).
 */
export const SAW_KERF_IN = 0.125;
