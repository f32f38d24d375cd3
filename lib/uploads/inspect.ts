/**
 * What an uploaded file really is, judged by its content as well as its name, and the limits
 * every upload obeys: a size limit, and for XLSX (a zip archive) a limit on what it would
 * unpack to, read from the zip's own central directory before anything is unpacked (the guard
 * against archive bombs: a small file that inflates to gigabytes).
 */
import { AppError } from '../errors';

/** The most an uploaded file may weigh. */
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
/** The most an XLSX may unpack to. */
export const MAX_UNPACKED_BYTES = 100 * 1024 * 1024;

export type UploadKind = 'csv' | 'xlsx' | 'pdf' | 'png';

const extensionKinds: Record<string, UploadKind> = { csv: 'csv', txt: 'csv', xlsx: 'xlsx', pdf: 'pdf', png: 'png' };

function looksLikeText(bytes: Uint8Array): boolean {
  const head = bytes.subarray(0, 8192);
  if (head.includes(0)) return false;
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(head.length === bytes.length ? head : head.subarray(0, head.length - 4));
    return true;
  } catch {
    return false;
  }
}

function contentKind(bytes: Uint8Array): UploadKind | null {
  const starts = (...sig: number[]) => sig.every((b, k) => bytes[k] === b);
  if (starts(0x50, 0x4b, 0x03, 0x04)) return 'xlsx';
  if (starts(0x25, 0x50, 0x44, 0x46, 0x2d)) return 'pdf';
  if (starts(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a)) return 'png';
  return looksLikeText(bytes) ? 'csv' : null;
}

/** Sum of the uncompressed sizes the zip's central directory declares (APPNOTE.TXT §4.3.12, §4.3.16). */
export function declaredUnpackedSize(bytes: Uint8Array): number {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  // The end-of-central-directory record is in the last 22 + 65535 bytes (its comment may follow it).
  let end = -1;
  for (let k = bytes.length - 22; k >= Math.max(0, bytes.length - 22 - 65535); k--)
    if (view.getUint32(k, true) === 0x06054b50) {
      end = k;
      break;
    }
  if (end < 0) throw new AppError('unprocessable', 'The file is not a valid XLSX workbook (no zip directory).');
  const entries = view.getUint16(end + 10, true);
  let offset = view.getUint32(end + 16, true);
  let total = 0;
  for (let k = 0; k < entries; k++) {
    if (offset + 46 > bytes.length || view.getUint32(offset, true) !== 0x02014b50)
      throw new AppError('unprocessable', 'The file is not a valid XLSX workbook (damaged zip directory).');
    total += view.getUint32(offset + 24, true);
    offset += 46 + view.getUint16(offset + 28, true) + view.getUint16(offset + 30, true) + view.getUint16(offset + 32, true);
  }
  return total;
}

/** Checks an upload's size, that its content is what its name says and one of `allowed`; returns its kind. */
export function inspectUpload<K extends UploadKind>(name: string, bytes: Uint8Array, allowed: K[]): K {
  if (bytes.length === 0) throw new AppError('unprocessable', 'The file is empty.');
  if (bytes.length > MAX_UPLOAD_BYTES) throw new AppError('too_large', `The file is over the ${MAX_UPLOAD_BYTES / 1024 / 1024} MB limit.`);
  const byName = extensionKinds[name.toLowerCase().split('.').pop() ?? ''];
  const byContent = contentKind(bytes);
  const names = allowed.map((k) => k.toUpperCase()).join(', ');
  if (!byName || !(allowed as UploadKind[]).includes(byName)) throw new AppError('unprocessable', `“${name}” is not one of the accepted types (${names}).`);
  if (byContent !== byName)
    throw new AppError(
      'unprocessable',
      `“${name}” is named ${byName.toUpperCase()} but its content is ${byContent ? byContent.toUpperCase() : 'not a file type Leeway reads'}.`,
    );
  if (byContent === 'xlsx' && declaredUnpackedSize(bytes) > MAX_UNPACKED_BYTES)
    throw new AppError('too_large', `The workbook would unpack to more than ${MAX_UNPACKED_BYTES / 1024 / 1024} MB; Leeway does not open it.`);
  return byContent as K;
}
