/**
 * An uploaded file as a route reads it: multipart/form-data (415 otherwise), no larger than the
 * upload limit (413, from Content-Length before reading), readable (400), with its file in the
 * field "file" (422 naming what to attach). The form comes back too, for the other fields.
 */
import { AppError } from '../errors';
import { requireMediaType } from '../request-body';
import { MAX_UPLOAD_BYTES } from './inspect';

/** Room for the multipart envelope around a file of the largest size allowed. */
const ENVELOPE_BYTES = 64 * 1024;

export async function readUploadForm(request: Request, words: { what: string; choose: string }): Promise<{ form: FormData; file: File; bytes: Uint8Array }> {
  requireMediaType(request, ['multipart/form-data']);
  if (Number(request.headers.get('content-length') ?? '0') > MAX_UPLOAD_BYTES + ENVELOPE_BYTES)
    throw new AppError('too_large', `The file is over the ${MAX_UPLOAD_BYTES / 1024 / 1024} MB limit.`);
  const form = await request.formData().catch(() => {
    throw new AppError('bad_request', 'The upload could not be read.');
  });
  const file = form.get('file');
  if (!(file instanceof File)) throw new AppError('unprocessable', `Attach ${words.what} as a file named “file”.`, { file: [words.choose] });
  return { form, file, bytes: new Uint8Array(await file.arrayBuffer()) };
}
