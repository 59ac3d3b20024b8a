import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { attachmentRoutes, batchAttachmentRoutes } from '../../../../shared/contract/attachments';
import { taproomKeys } from './keys';

export const attachmentsQuery = (batchId: number) =>
  queryOptions({
    queryKey: taproomKeys.attachments(batchId),
    queryFn: () => call(batchAttachmentRoutes.list, { params: { batchId } }),
  });
export const useAttachments = (batchId: number) => useQuery(attachmentsQuery(batchId));

export function useUploadAttachment(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return call(batchAttachmentRoutes.upload, { params: { batchId }, body: form });
    },
    onSuccess: () => client.invalidateQueries({ queryKey: taproomKeys.attachments(batchId) }),
  });
}

/** Removes a file (head brewer); one on a tasting note or a release sheet answers 409 with the reason. */
export function useRemoveAttachment(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => call(attachmentRoutes.remove, { params: { attachmentId: id } }),
    onSuccess: () => client.invalidateQueries({ queryKey: taproomKeys.attachments(batchId) }),
  });
}
