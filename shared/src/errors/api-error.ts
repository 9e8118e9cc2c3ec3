/** One field's problem, as the server's validation reports it. */
export interface FieldError {
  field: string;
  message: string;
}

/** The single JSON shape of every error the API returns. */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  details?: FieldError[];
}
