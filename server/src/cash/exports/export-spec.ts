/**
 * One kind of export: its header row and one statement over the firm's rows in the range, in the
 * order the file lists them. The statement takes $1 the firm, $2 the first day and $3 the last day
 * (firm-local dates, both included); each row becomes the cells under the header.
 */
export interface ExportSpec<R> {
  readonly header: readonly string[];
  readonly sql: string;
  readonly toCells: (row: R) => string[];
}

/** The firm's local date of a timestamp column (clients.created_at), for the SQL of a spec. */
export const firmDate = (column: string) => `(${column} at time zone (select f.time_zone from firms f where f.id = $1))::date`;
