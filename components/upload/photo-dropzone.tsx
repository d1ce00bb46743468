'use client';

import { type DragEvent, useId, useState } from 'react';
import {
  formatBytes,
  HEIC_MESSAGE,
  MAX_PHOTO_BYTES,
  PHOTO_MIMES,
  type PhotoEndpoint,
  TOO_LARGE_MESSAGE,
  type UploadedPhoto,
  WRONG_TYPE_MESSAGE,
} from '@/lib/uploads/limits';
import { PhotoOnStage } from './photo-on-stage';
import { useUploadThing } from './uploadthing';

type Props = {
  endpoint: PhotoEndpoint;
  onUploaded?: (photo: UploadedPhoto) => void;
  label?: string;
};

type State =
  | { phase: 'idle'; error?: string }
  | { phase: 'uploading'; progress: number; name: string }
  | { phase: 'done'; photo: UploadedPhoto; name: string };

// A large drop area (tap to choose on a phone) over the UploadThing client: the file goes
// from the browser to the upload service, the server checks it and answers with its size.
export function PhotoDropzone({ endpoint, onUploaded, label = 'Add a photo' }: Props) {
  const inputId = useId();
  const cameraId = useId();
  const [state, setState] = useState<State>({ phase: 'idle' });
  const [over, setOver] = useState(false);
  const { startUpload } = useUploadThing(endpoint, {
    uploadProgressGranularity: 'fine',
    onUploadProgress: (progress) => setState((s) => (s.phase === 'uploading' ? { ...s, progress } : s)),
    onUploadError: (e) => setState({ phase: 'idle', error: e.message || 'The upload failed; nothing was saved.' }),
  });

  async function upload(file: File | undefined) {
    if (!file) return;
    if (/^image\/hei[cf]/.test(file.type) || /\.hei[cf]$/i.test(file.name)) return setState({ phase: 'idle', error: HEIC_MESSAGE });
    if (!PHOTO_MIMES.includes(file.type)) return setState({ phase: 'idle', error: `${file.name} is not a JPEG, PNG or WebP file. ${WRONG_TYPE_MESSAGE}` });
    if (file.size > MAX_PHOTO_BYTES) return setState({ phase: 'idle', error: `${file.name} is ${formatBytes(file.size)}. ${TOO_LARGE_MESSAGE}` });
    if (file.size === 0) return setState({ phase: 'idle', error: `${file.name} is empty (0 bytes).` });
    setState({ phase: 'uploading', progress: 0, name: file.name });
    const result = await startUpload([file]);
    const data = result?.[0]?.serverData;
    if (!data) return; // onUploadError has said why
    if ('refused' in data) return setState({ phase: 'idle', error: data.refused.message });
    setState({ phase: 'done', photo: data, name: file.name });
    onUploaded?.(data);
  }

  function onDrop(e: DragEvent<HTMLLabelElement>) {
    e.preventDefault();
    setOver(false);
    if (state.phase !== 'uploading') void upload(e.dataTransfer.files[0]);
  }

  if (state.phase === 'done') {
    const { photo } = state;
    return (
      <figure className="space-y-2">
        <PhotoOnStage photoId={photo.photoId} alt={`Uploaded photo ${state.name}`} />
        <figcaption className="flex flex-wrap items-center justify-between gap-2 text-sm">
          <span role="status" className="num">
            Uploaded <span className="break-all font-medium">{state.name}</span>: {photo.width} × {photo.height} px · {formatBytes(photo.size)}
          </span>
          <button type="button" onClick={() => setState({ phase: 'idle' })} className="min-h-tap rounded-md border border-panel-line bg-white px-4 font-medium hover:bg-panel-deep">
            Upload another
          </button>
        </figcaption>
      </figure>
    );
  }

  const busy = state.phase === 'uploading';
  return (
    <div className="space-y-2">
      <label
        htmlFor={inputId}
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        aria-busy={busy}
        className={`flex min-h-40 cursor-pointer flex-col items-center justify-center gap-2 rounded-lg border-2 border-dashed p-6 text-center focus-within:outline focus-within:outline-3 focus-within:outline-accent ${over ? 'border-accent bg-accent-soft' : 'border-panel-line bg-white'}`}
      >
        <span className="text-lg font-semibold">{busy ? `Uploading ${state.name}…` : label}</span>
        <span className="text-sm text-ink-soft">Drop a JPEG, PNG or WebP here, or tap to choose · up to {MAX_PHOTO_BYTES / (1024 * 1024)} MB</span>
        {busy ? (
          <span className="flex w-full max-w-xs items-center gap-2" role="status" aria-live="polite">
            <progress className="h-3 w-full accent-accent" max={100} value={state.progress} aria-label="Upload progress" />
            <span className="num w-12 text-right text-sm">{Math.round(state.progress)} %</span>
          </span>
        ) : (
          <span className="inline-flex min-h-tap items-center rounded-md bg-accent px-4 font-medium text-white">Choose a photo</span>
        )}
        <input
          id={inputId}
          type="file"
          accept={PHOTO_MIMES.join(',')}
          className="sr-only"
          disabled={busy}
          data-testid="photo-input"
          onChange={(e) => {
            void upload(e.target.files?.[0]);
            e.target.value = '';
          }}
        />
      </label>
      {busy ? null : (
        // On a phone this opens the back camera straight away (HTML Media Capture, W3C);
        // elsewhere it is one more way to choose a file.
        <label htmlFor={cameraId} className="flex min-h-tap cursor-pointer items-center justify-center gap-2 rounded-md border border-panel-line bg-white px-4 font-medium focus-within:outline focus-within:outline-3 focus-within:outline-accent hover:bg-panel">
          <svg aria-hidden width="22" height="22" viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round">
            <path d="M4 8h3l2-3h6l2 3h3v11H4z" />
            <circle cx="12" cy="13" r="3.5" />
          </svg>
          Take a photo with the camera
          <input
            id={cameraId}
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            data-testid="camera-input"
            onChange={(e) => {
              void upload(e.target.files?.[0]);
              e.target.value = '';
            }}
          />
        </label>
      )}
      {state.phase === 'idle' && state.error ? (
        <p role="alert" className="rounded-md border border-band-off/40 bg-white px-3 py-2 text-sm text-band-off">
          {state.error}
        </p>
      ) : null}
    </div>
  );
}
