import type { CrewPhotoTicket, CrewPhotoUploadInput } from '@shared/contracts/crew-photos';
import { api } from '@/lib/api-client';

/**
 * Registers a crew photo under the key the device made for it and answers where to upload it. Sending the same key
 * again answers the same photo (`replayed`), with `upload` null once it is stored.
 */
export const registerCrewPhoto = (
  requestId: string,
  file: Omit<CrewPhotoUploadInput, 'contentType'> & { contentType: string },
) => api.post<CrewPhotoTicket>(`/api/crew/jobs/${requestId}/photos`, file);
