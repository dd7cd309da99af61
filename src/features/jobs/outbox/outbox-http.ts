import type { CrewPhotoTicket, CrewPhotoUploadInput } from '@shared/contracts/crew-photos';
import type { AsBuiltSetView } from '@shared/crew/crew-views';
import { ApiError, api } from '@/lib/api-client';
import { StorageStepError, type OutboxItem } from './outbox-queue';

/** Sends a set of readings under its key; a repeat of a stored set is answered with the first answer. */
export const sendReadings = (requestId: string, key: string, body: unknown) =>
  api
    .withHeaders({ 'Idempotency-Key': key })
    .post<{ set: AsBuiltSetView }>(`/api/crew/jobs/${requestId}/as-built`, body);

/**
 * A photo's three steps: register it under its key (a repeat answers the same photo, with no upload once it is
 * stored), put the bytes straight to storage, then have the server check them. Every step may be repeated.
 */
async function sendPhoto(item: Extract<OutboxItem, { type: 'photo' }>) {
  const { photo } = item;
  const registration: CrewPhotoUploadInput = {
    idempotencyKey: item.key,
    kind: photo.kind,
    fileName: photo.fileName,
    contentType: photo.contentType as CrewPhotoUploadInput['contentType'],
    sizeBytes: photo.sizeBytes,
    caption: photo.caption,
    gpsLat: photo.gpsLat,
    gpsLng: photo.gpsLng,
  };
  const ticket = await api.post<CrewPhotoTicket>(`/api/crew/jobs/${item.requestId}/photos`, registration);
  if (!ticket.upload) return;
  const put = await fetch(ticket.upload.url, { method: 'PUT', headers: ticket.upload.headers, body: photo.blob });
  if (!put.ok) throw new StorageStepError(`Storage did not take the photo (${put.status}); it will be sent again.`);
  try {
    await api.post(`/api/crew/jobs/${item.requestId}/photos/${ticket.photo.id}/confirm`, {
      caption: photo.caption,
      gpsLat: photo.gpsLat,
      gpsLng: photo.gpsLng,
    });
  } catch (error) {
    // The bytes did not land after all: the next try registers again (same key, a fresh address) and re-uploads.
    if (error instanceof ApiError && error.status === 409) throw new StorageStepError(error.message);
    throw error;
  }
}

export async function sendItem(item: OutboxItem) {
  if (item.type === 'readings') await sendReadings(item.requestId, item.key, item.body);
  else await sendPhoto(item);
}
