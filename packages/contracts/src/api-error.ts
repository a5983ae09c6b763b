// The error envelope of the API contract, shared by server and client.
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    fields?: Record<string, string>;
  };
}

export interface ListResponse<T> {
  items: T[];
  total: number;
}
