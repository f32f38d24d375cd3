/**
 * One operation of the API, declared once: the route file passes it to lib/api.ts's withAuth
 * (which enforces its permission and parses its body), and lib/openapi/document.ts describes it.
 * So the document's roles, bodies and answers are the ones the code runs with.
 */
import type { z } from 'zod';
import type { Permission } from '../permissions';

export type Method = 'get' | 'post' | 'patch' | 'delete';

export type Tag =
  'Projects' | 'Cases' | 'Valuations' | 'Review' | 'Follow-through' | 'Volatility' | 'Documents' | 'Portfolio' | 'Settings' | 'API keys' | 'Reference';

export interface Answer {
  description: string;
  /** A JSON answer's shape; absent for an answer without a body (204) or a file. */
  schema?: z.ZodType;
  /** A file's media type (PDF, XLSX, CSV): the answer is the file's bytes. */
  file?: string;
}

export interface Operation {
  method: Method;
  /** The path as OpenAPI writes it: /api/v1/cases/{caseId}. */
  path: string;
  summary: string;
  description?: string;
  tag: Tag;
  /** What the caller's role must allow; any member may call an operation without one. */
  permission?: Permission;
  /** A JSON body the wrapper parses and validates before the handler runs. */
  body?: z.ZodType;
  /** A body the handler reads itself (an upload, an engine model), described for the document only. */
  otherBody?: { contentType: string; schema: z.ZodType; description: string };
  query?: z.ZodObject;
  /** The successful answers by status; error answers are added by the document (the one error shape). */
  answers: Record<number, Answer>;
  /** An example body for the reference page's example request. */
  example?: unknown;
}
