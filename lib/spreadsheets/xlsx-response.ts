/** A workbook as a download. */
export function xlsxResponse(bytes: Buffer, filename: string): Response {
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      // An ASCII fallback for old clients, and the name as written (en dashes, accents) per RFC 6266.
      'content-disposition': `attachment; filename="${filename.replace(/[^\w .()-]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(filename)}`,
      // Case data: never kept in a shared or browser cache.
      'cache-control': 'no-store',
    },
  });
}
