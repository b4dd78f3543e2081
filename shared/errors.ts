/** The JSON error body every API error uses; the client's ApiError reads it. */
export type ApiErrorBody = {
  error: {
    code: string;
    message: string;
    fieldErrors?: Record<string, string[]>;
  };
};
