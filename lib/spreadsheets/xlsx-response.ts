import { attachmentDisposition } from '../content-disposition';

/** A workbook as a download. */
export function xlsxResponse(bytes: Buffer, filename: string): Response {
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      'content-disposition': attachmentDisposition(filename),
      // Case data: never kept in a shared or browser cache.
      'cache-control': 'no-store',
    },
  });
}
