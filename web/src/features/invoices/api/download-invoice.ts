import { useMutation } from '@tanstack/react-query';
import { apiBlob } from '@/lib/api-client';
import { saveFile } from '@/lib/save-file';

/** Fetches the issued PDF with the user's token and hands it to the browser as a download named by its number. */
export function useDownloadInvoice() {
  return useMutation({
    mutationFn: async ({ id, number }: { id: string; number: string | null }) => saveFile(await apiBlob(`/invoices/${encodeURIComponent(id)}/pdf`), `${number ?? 'invoice'}.pdf`),
  });
}
