/** The largest PostgreSQL `integer`: a bigger whole number passes @IsInt() but fails in SQL, so DTOs cap at this. */
export const PG_INTEGER_MAX = 2_147_483_647;
