/** Longest message between a buyer and a grower, in characters (zod-free, for the browser's counter). */
export const MESSAGE_MAX_CHARS = 2000;
