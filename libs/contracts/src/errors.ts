/** The JSON body of every error answer, REST and socket alike. */
export interface ApiErrorBody {
  statusCode: number;
  /** A stable machine code, e.g. `validation_failed`, `not_found`, `forbidden`. */
  code: string;
  /** A sentence a person can read. */
  message: string;
  /** One entry per bad field when validation failed. */
  issues?: { path: string; message: string }[];
}
