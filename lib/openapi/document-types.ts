import type { ApiAccess, ApiExample } from './types';
import type { JsonSchema } from './json-schema';

/** The parts of an OpenAPI 3.1 document Seamline writes (and the API page reads). */
export interface OpenApiParameter {
  name: string;
  in: 'path' | 'query';
  required: boolean;
  description?: string;
  schema: JsonSchema;
}

export interface OpenApiMediaType {
  schema: JsonSchema;
}

export interface OpenApiResponse {
  description: string;
  headers?: Record<string, { description: string; schema: JsonSchema }>;
  content?: Record<string, OpenApiMediaType>;
}

export interface OpenApiOperation {
  operationId: string;
  tags: string[];
  summary: string;
  description?: string;
  security: Record<string, string[]>[];
  parameters?: OpenApiParameter[];
  requestBody?: { required: boolean; description: string; content: Record<string, OpenApiMediaType>; 'x-max-bytes': number };
  responses: Record<string, OpenApiResponse | { $ref: string }>;
  /** Who may call it (see `ApiAccess`). */
  'x-access': ApiAccess;
  /** The documented examples; those marked `executed` are run against the live app by tests/api/openapi-examples.test.ts. */
  'x-examples': ApiExample[];
}

export interface OpenApiDocument {
  openapi: '3.1.0';
  info: { title: string; version: string; description: string };
  servers: { url: string; description: string }[];
  tags: { name: string; description?: string }[];
  paths: Record<string, Partial<Record<'get' | 'post' | 'put' | 'patch' | 'delete', OpenApiOperation>>>;
  components: {
    schemas: Record<string, JsonSchema>;
    responses: Record<string, OpenApiResponse>;
    securitySchemes: Record<string, Record<string, string>>;
  };
}
