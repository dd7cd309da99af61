import AwsS3 from '@uppy/aws-s3';
import Uppy, { type Meta, type UppyFile } from '@uppy/core';
import '@uppy/core/css/style.min.css';
import '@uppy/dashboard/css/style.min.css';
import Dashboard from '@uppy/react/dashboard';
import { useEffect, useRef, useState } from 'react';
import { maxPhotoBytes, photoContentTypes } from '@shared/requests/photo-rules';
import { confirmUpload } from '../api/confirm-upload';
import { requestUpload } from '../api/request-upload';
import { readPosition, withoutMetadata } from './photo-metadata';

type PhotoMeta = Meta & { photoId?: string; gpsLat?: number; gpsLng?: number };

export interface UploaderProps {
  requestId: string;
  /** How many more photos the request can take. */
  room: number;
  onStored: () => void;
  onPosition: (lat: number, lng: number) => void;
  onProblem: (message: string) => void;
}

// Some browsers leave HEIC files without a type; the extension says what they are.
const typeOf = (file: UppyFile<PhotoMeta, Record<string, never>>) =>
  file.type || (/\.heic$/i.test(file.name ?? '') ? 'image/heic' : 'application/octet-stream');

function buildUppy(props: { current: UploaderProps }) {
  const uppy = new Uppy<PhotoMeta, Record<string, never>>({
    autoProceed: true,
    restrictions: {
      maxFileSize: maxPhotoBytes,
      allowedFileTypes: [...photoContentTypes, '.heic', '.jpg', '.jpeg', '.png', '.webp'],
      maxNumberOfFiles: props.current.room,
    },
  });
  uppy.use(AwsS3, {
    shouldUseMultipart: false,
    allowedMetaFields: false,
    generateObjectKey: (file) => file.id,
    signRequest: async (request) => {
      const file = uppy.getFile(request.key);
      if (request.method !== 'PUT' || !file) throw new Error('Only single photo uploads are supported.');
      const ticket = await requestUpload(props.current.requestId, {
        fileName: file.name ?? 'photo',
        contentType: typeOf(file),
        sizeBytes: file.size ?? 0,
      });
      uppy.setFileMeta(file.id, { photoId: ticket.photo.id });
      return { url: ticket.upload.url, headers: ticket.upload.headers };
    },
  });
  // Before each upload: note the position, then swap in a copy without the camera's metadata.
  uppy.addPreProcessor(async (fileIDs) => {
    await Promise.all(
      fileIDs.map(async (id) => {
        const file = uppy.getFile(id);
        if (!file || file.meta.photoId) return;
        const position = await readPosition(file.data as Blob);
        if (position) {
          uppy.setFileMeta(id, { gpsLat: position.latitude, gpsLng: position.longitude });
          props.current.onPosition(position.latitude, position.longitude);
        }
        const clean = await withoutMetadata(file.data as Blob, typeOf(file));
        if (clean) uppy.setFileState(id, { data: clean, size: clean.size });
      }),
    );
  });
  uppy.on('upload-success', (file) => {
    const current = file && uppy.getFile(file.id);
    if (!current?.meta.photoId) return;
    const { photoId, gpsLat, gpsLng } = current.meta;
    confirmUpload(props.current.requestId, photoId, { gpsLat: gpsLat ?? null, gpsLng: gpsLng ?? null })
      .then(() => {
        uppy.removeFile(current.id);
        props.current.onStored();
      })
      .catch(() => props.current.onProblem(`“${current.name}” did not arrive complete. Remove it and add it again.`));
  });
  return uppy;
}

/** The drop area: each photo goes from the browser straight to storage under a URL the server signed for it. */
export default function PhotoUploader(props: UploaderProps) {
  const latest = useRef(props);
  // Uppy's handlers read the latest props when a file finishes; they are never read while rendering.
  useEffect(() => {
    latest.current = props;
  });
  const [uppy, setUppy] = useState<ReturnType<typeof buildUppy> | null>(null);
  useEffect(() => {
    const instance = buildUppy(latest);
    setUppy(instance);
    return () => instance.destroy();
  }, [props.requestId]);
  useEffect(() => {
    uppy?.setOptions({ restrictions: { ...uppy.opts.restrictions, maxNumberOfFiles: props.room } });
  }, [uppy, props.room]);
  if (!uppy) return null;
  return (
    <Dashboard
      uppy={uppy}
      height={300}
      width="100%"
      proudlyDisplayPoweredByUppy={false}
      note="JPEG, PNG, WebP or HEIC, up to 15 MB each."
    />
  );
}
