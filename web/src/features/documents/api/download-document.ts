import { useMutation } from '@tanstack/react-query';
import { apiBlob } from '@/lib/api-client';
import type { JobDocument } from './get-job-documents';

/** Fetches the issued PDF with the user's token and hands it to the browser as a download named by its number. */
async function downloadDocument(doc: JobDocument): Promise<void> {
  const blob = await apiBlob(`/documents/${encodeURIComponent(doc.id)}/pdf`);
  const url = URL.createObjectURL(blob);
  try {
    const a = document.createElement('a');
    a.href = url;
    a.download = `${doc.number}.pdf`;
    a.click();
  } finally {
    setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }
}

export function useDownloadDocument() {
  return useMutation({ mutationFn: downloadDocument });
}
