/**
 * A timestamptz column as the ISO 8601 text the API answers (what Date#toISOString prints, in UTC
 * to the millisecond), made by PostgreSQL: a list answers it as read, without a Date per row.
 */
export const isoUtcText = (column: string) => `to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;
