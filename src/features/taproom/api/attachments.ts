import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AttachmentView } from '../../../../shared/schemas/taproom';
import { taproomKeys } from './keys';

export const attachmentsQuery = (batchId: number) =>
  queryOptions({
    queryKey: taproomKeys.attachments(batchId),
    queryFn: () => api.get<AttachmentView[]>(`/api/batches/${batchId}/attachments`),
  });
export const useAttachments = (batchId: number) => useQuery(attachmentsQuery(batchId));

export function useUploadAttachment(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return api.upload<AttachmentView>(`/api/batches/${batchId}/attachments`, form);
    },
    onSuccess: () => client.invalidateQueries({ queryKey: taproomKeys.attachments(batchId) }),
  });
}

/** Removes a file (head brewer); one on a tasting note or a release sheet answers 409 with the reason. */
export function useRemoveAttachment(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/attachments/${id}`),
    onSuccess: () => client.invalidateQueries({ queryKey: taproomKeys.attachments(batchId) }),
  });
}
