import { useMutation } from '@tanstack/react-query';
import { apiBlob } from '@/lib/api-client';
import { saveFile } from '@/lib/save-file';
import type { JobDocument } from './get-job-documents';

/** Fetches the issued PDF with the user's token and hands it to the browser as a download named by its number. */
async function downloadDocument(doc: JobDocument): Promise<void> {
  saveFile(await apiBlob(`/documents/${encodeURIComponent(doc.id)}/pdf`), `${doc.number}.pdf`);
}

export function useDownloadDocument() {
  return useMutation({ mutationFn: downloadDocument });
}
