/**
 * Version of the hydraulics engine. Saved with every worked calculation so a
 * reader can tell which formulas and tables produced a stored result.
 * Bump the minor number when a table or default changes numbers, the major
 * number when a schema field changes meaning.
 */
// 1.1: efficiency bands from published tables, drive pipe check with shut-off pressure and fatigue
export const ENGINE_VERSION = '1.1.0';
