import AwsS3 from '@uppy/aws-s3';
import Uppy, { type Meta, type UppyFile } from '@uppy/core';
import '@uppy/core/css/style.min.css';
import '@uppy/dashboard/css/style.min.css';
import Dashboard from '@uppy/react/dashboard';
import { useEffect, useRef, useState } from 'react';
import { maxPhotoBytes } from '@shared/requests/photo-rules';
import { photoLeadingBytes, photoRefusal, photoTypeOf } from '@shared/requests/photo-signature';
import { confirmUpload } from '../api/confirm-upload';
import { requestUpload } from '../api/request-upload';
import { readPosition, withoutMetadata } from './photo-metadata';

type PhotoMeta = Meta & { photoId?: string; gpsLat?: number; gpsLng?: number; photoType?: string };

export interface UploaderProps {
  requestId: string;
  /** How many more photos the request can take. */
  room: number;
  onStored: () => void;
  onPosition: (lat: number, lng: number) => void;
  onProblem: (message: string) => void;
}

// The type read from the file's first bytes when it was added; never the name's.
const typeOf = (file: UppyFile<PhotoMeta, Record<string, never>>) => file.meta.photoType ?? 'application/octet-stream';

/** The photo box's words, in place of the upload widget's own. */
const dashboardWords = {
  strings: {
    dropPasteFiles: 'Drop photos here or %{browseFiles}',
    browseFiles: 'choose them from this device',
    dropHint: 'Drop the photos here',
    dashboardTitle: 'Add site photos',
    dashboardWindowTitle: 'Add site photos',
    myDevice: 'This device',
    addMore: 'Add more photos',
    addMoreFiles: 'Add more photos',
    removeFile: 'Take this photo out',
    uploadComplete: 'Saved',
    uploading: 'Sending photos',
    complete: 'All photos saved',
    uploadFailed: 'A photo did not arrive',
    retry: 'Try again',
    retryUpload: 'Try sending it again',
    cancel: 'Stop',
    cancelUpload: 'Stop sending',
    done: 'Done',
    xFilesSelected: { 0: '%{smart_count} photo chosen', 1: '%{smart_count} photos chosen' },
    uploadingXFiles: { 0: 'Sending %{smart_count} photo', 1: 'Sending %{smart_count} photos' },
    processingXFiles: { 0: 'Preparing %{smart_count} photo', 1: 'Preparing %{smart_count} photos' },
    showErrorDetails: 'Why?',
  },
};

function buildUppy(props: { current: UploaderProps }) {
  // Size and type are judged by the file's bytes when it is added (photoRefusal), in our words and once; only the
  // count is left to the widget. Nothing is sent until a file has passed.
  const uppy = new Uppy<PhotoMeta, Record<string, never>>({
    autoProceed: false,
    restrictions: { maxNumberOfFiles: props.current.room },
    locale: {
      strings: {
        youCanOnlyUploadX: {
          0: 'This request can take %{smart_count} more photo.',
          1: 'This request can take %{smart_count} more photos.',
        },
      },
      pluralize: (n: number) => (n === 1 ? 0 : 1),
    },
  });
  uppy.on('file-added', (file) => {
    const data = file.data as Blob;
    void data
      .slice(0, photoLeadingBytes)
      .arrayBuffer()
      .then((buffer) => {
        const leading = new Uint8Array(buffer);
        const refusal = photoRefusal(file.name ?? 'This file', data.size, leading, maxPhotoBytes);
        if (!uppy.getFile(file.id)) return;
        if (refusal) {
          uppy.removeFile(file.id);
          props.current.onProblem(refusal);
          return;
        }
        uppy.setFileMeta(file.id, { photoType: photoTypeOf(leading) ?? undefined });
        // Photos added together are sent together: only once every one has been judged, since sending starts with
        // all of them and one not yet read would go without its type (and keep its camera metadata).
        if (uppy.getFiles().every((f) => f.meta.photoType)) void uppy.upload();
      });
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
    <div className="photo-box">
      <Dashboard
        uppy={uppy}
        height={300}
        width="100%"
        proudlyDisplayPoweredByUppy={false}
        note="JPEG, PNG, WebP or HEIC photos, up to 15 MB each. Each file is checked by its contents, not its name."
        locale={dashboardWords}
      />
    </div>
  );
}
