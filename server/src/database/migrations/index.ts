import { CreateUsersAndTokens1764633600000 } from './1764633600000-CreateUsersAndTokens';

/** Listed explicitly, oldest first, so the CLI, the app and jest load the same migrations without globs. */
export const migrations = [CreateUsersAndTokens1764633600000];
