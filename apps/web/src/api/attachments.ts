import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  apiFetch,
  ConnectionError,
  csrfToken,
  json,
  notifySessionLost,
  refreshSession,
  toApiError,
} from './client';
import type { Attachment } from '@hoopline/contract';

export const attachmentKeys = {
  ofComponent: (componentId: string) => ['components', componentId, 'attachments'] as const,
};

export function useAttachments(componentId: string) {
  return useQuery({
    queryKey: attachmentKeys.ofComponent(componentId),
    queryFn: () => apiFetch<{ items: Attachment[] }>(`/components/${componentId}/attachments`),
    enabled: Boolean(componentId),
  });
}

export function useDeleteAttachment(componentId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/attachments/${id}`, json('DELETE')),
    onSuccess: () =>
      client.invalidateQueries({ queryKey: attachmentKeys.ofComponent(componentId) }),
  });
}

/** Where an image's bytes are served for a thumbnail (images only; the server sends the rest as downloads). */
export function inlineContentUrl(id: string): string {
  return `/api/attachments/${id}/content?disposition=inline`;
}

export function contentPath(id: string): string {
  return `/attachments/${id}/content`;
}

export interface UploadProgress {
  readonly loaded: number;
  readonly total: number;
}

interface XhrAnswer {
  readonly status: number;
  readonly text: string;
}

function sendOnce(
  componentId: string,
  file: File,
  onProgress: (progress: UploadProgress) => void,
  signal: AbortSignal | undefined,
): Promise<XhrAnswer> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/components/${componentId}/attachments`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('accept', 'application/json');
    const token = csrfToken();
    if (token) xhr.setRequestHeader('x-csrf-token', token);
    xhr.upload.onprogress = (event) => {
      onProgress({ loaded: event.loaded, total: event.lengthComputable ? event.total : file.size });
    };
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () => reject(new ConnectionError('cannot reach the Hoopline server'));
    xhr.onabort = () => reject(new DOMException('the upload was cancelled', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    const form = new FormData();
    // The one part the API reads (API.md: multipart/form-data, part `file`).
    form.append('file', file, file.name);
    xhr.send(form);
  });
}

function parse(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/**
 * Uploads one file. XMLHttpRequest rather than fetch, because only it reports
 * upload progress (`upload.onprogress`). Same rules as apiFetch: the CSRF
 * header, and one refresh and retry on a 401 (an expired access token).
 */
export async function uploadAttachment(
  componentId: string,
  file: File,
  onProgress: (progress: UploadProgress) => void,
  signal?: AbortSignal,
): Promise<Attachment> {
  let answer = await sendOnce(componentId, file, onProgress, signal);
  if (answer.status === 401) {
    if (await refreshSession()) {
      onProgress({ loaded: 0, total: file.size });
      answer = await sendOnce(componentId, file, onProgress, signal);
    } else {
      notifySessionLost();
      throw toApiError(401, parse(answer.text));
    }
  }
  const body = parse(answer.text);
  if (answer.status < 200 || answer.status >= 300) throw toApiError(answer.status, body);
  return body as Attachment;
}
