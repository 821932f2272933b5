/** Most lots shown side by side (zod-free, so the catalogue's first load does not carry the schema library). */
export const MAX_COMPARED_LOTS = 4;
