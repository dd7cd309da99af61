import type { CrewPhotoConfirmInput, CrewPhotoView } from '@shared/contracts/crew-photos';
import { api } from '@/lib/api-client';

/** After the bytes are in storage: the server checks them and lists the photo. Confirming twice is harmless. */
export const confirmCrewPhoto = (requestId: string, photoId: string, extra: CrewPhotoConfirmInput) =>
  api.post<{ photo: CrewPhotoView & { url: string } }>(`/api/crew/jobs/${requestId}/photos/${photoId}/confirm`, extra);
