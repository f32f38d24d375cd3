/** A workbook as a download. */
export function xlsxResponse(bytes: Buffer, filename: string): Response {
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      'content-disposition': `attachment; filename="${filename.replace(/[^\w .()-]/g, '_')}"`,
      // Case data: never kept in a shared or browser cache.
      'cache-control': 'no-store',
    },
  });
}
