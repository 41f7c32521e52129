/** One documented route of the public API, with an example that a test executes. */
export interface ApiField {
  name: string;
  type: string;
  /** Unit, e.g. "Hz", "ms", "dB", "m", "°C"; empty for unit-less fields. */
  unit?: string;
  required?: boolean;
  description: string;
}

export interface ApiExample {
  title: string;
  request: unknown;
  /** Status the example answers with. */
  status: number;
  /** A short excerpt of the answer to show (the test checks these keys exist in the real answer). */
  responseExcerpt: Record<string, unknown>;
}

export interface ApiRouteDoc {
  id: string;
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  path: string;
  summary: string;
  /** "none" for compute routes; "session" for library routes. */
  auth: 'none' | 'session';
  fields: ApiField[];
  answer: ApiField[];
  examples: ApiExample[];
  notes?: string[];
}
