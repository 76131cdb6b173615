import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportUploadRequest, ImportUploadResponse, UploadPreview } from '@upwell/common';
import { api, ApiError, getToken } from './client';
import { seriesKeys } from './series';

/**
 * Sends a file as multipart with upload progress (fetch cannot report upload
 * progress; XMLHttpRequest can). Resolves to the server's preview.
 */
export function uploadFile(groupId: string, file: File, onProgress: (fraction: number) => void, signal?: AbortSignal): Promise<UploadPreview> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/groups/${groupId}/uploads`);
    xhr.setRequestHeader('Authorization', `Bearer ${getToken() ?? ''}`);
    xhr.responseType = 'json';
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => {
      const body = xhr.response as (UploadPreview & { message?: string }) | null;
      if (xhr.status >= 200 && xhr.status < 300 && body) resolve(body);
      else reject(new ApiError(xhr.status, body?.message ?? `the upload failed (${xhr.status})`));
    };
    xhr.onerror = () => reject(new ApiError(0, 'the upload was interrupted; check your connection and try again'));
    xhr.onabort = () => reject(new ApiError(0, 'the upload was cancelled'));
    signal?.addEventListener('abort', () => xhr.abort());
    const form = new FormData();
    form.append('file', file);
    xhr.send(form);
  });
}

/** Turns a staged upload into series, as mapped by the researcher. */
export function useImportUpload(uploadId: string | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ImportUploadRequest) => api<ImportUploadResponse>(`/uploads/${uploadId}/import`, { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: seriesKeys.all }),
  });
}

/** Throws a staged upload away. */
export function discardUpload(uploadId: string): Promise<void> {
  return api<void>(`/uploads/${uploadId}`, { method: 'DELETE' });
}
