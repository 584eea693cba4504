/** Access tokens are pinned to one algorithm, issuer and audience; anything else is refused. */
export const JWT_ALGORITHM = 'HS256';
export const JWT_ISSUER = 'keenroute';
export const JWT_AUDIENCE = 'keenroute-api';
export const ACCESS_TOKEN_SECONDS = 15 * 60;
export const REFRESH_TOKEN_DAYS = 14;
export const REFRESH_COOKIE = 'kr_refresh';
export const REFRESH_COOKIE_PATH = '/api/auth';
export const INVITE_HOURS = 72;
export const RESET_HOURS = 1;
export const BCRYPT_COST = 12;
