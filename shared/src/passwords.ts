/** Shortest password Keenroute accepts when a person sets one (invitation or reset). */
export const PASSWORD_MIN_LENGTH = 10;
/** Longest: bcrypt reads only the first 72 bytes, so a longer one would be silently truncated. */
export const PASSWORD_MAX_LENGTH = 72;
