'use client';

import { useEffect, useState } from 'react';
import { usePhotoBlob } from '@/lib/local';

export interface BenchPhotoProps {
  photoId: string;
  caption: string;
  /** Thumbnail in a list, or the full photo. */
  size: 'thumb' | 'full';
  /** Bytes still only on this device (shown from the device), if known. */
  waitingUpload?: boolean;
  problem?: string;
}

/**
 * One bench photo: from this device's copy when it has one (works offline), else from the server
 * through a short-lived signed URL (GET /api/v1/photos/:id/image redirects to it).
 */
export function BenchPhoto({ photoId, caption, size, waitingUpload, problem }: BenchPhotoProps) {
  const blob = usePhotoBlob(photoId);
  const [localUrl, setLocalUrl] = useState<string | null>(null);
  const [failed, setFailed] = useState(false);
  useEffect(() => {
    if (!blob) return;
    const url = URL.createObjectURL(blob);
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the object URL is an external resource made and revoked with the blob
    setLocalUrl(url);
    return () => URL.revokeObjectURL(url);
  }, [blob]);
  const alt = caption || 'Bench photo';
  const box = size === 'thumb' ? 'h-28 w-36' : 'max-h-[70vh] w-full';
  if (blob === undefined) return <div className={`${box} animate-pulse rounded-md bg-paper-deep`} aria-hidden />;
  const src = localUrl ?? (blob === null ? `/api/v1/photos/${photoId}/image?variant=${size}` : null);
  return (
    <figure className="space-y-1">
      {src && !failed ? (
        // eslint-disable-next-line @next/next/no-img-element -- device blobs and signed URLs, not build-time images
        <img src={src} alt={alt} className={`${box} rounded-md border border-rule bg-paper-deep ${size === 'thumb' ? 'object-cover' : 'object-contain'}`} onError={() => setFailed(true)} data-photo-id={photoId} data-source={localUrl ? 'device' : 'server'} />
      ) : (
        <div className={`${box} flex items-center justify-center rounded-md border border-dashed border-rule p-2 text-center text-xs text-ink-soft`} data-photo-id={photoId}>
          {src === null ? 'Loading…' : navigatorOffline() ? 'Photo on the server: connect to see it.' : 'Photo not uploaded yet: it arrives when the device that took it syncs.'}
        </div>
      )}
      {(caption || waitingUpload || problem) && (
        <figcaption className="text-xs text-ink-soft">
          {caption}
          {waitingUpload && !problem && <span className="block">Waiting to upload from this device.</span>}
          {problem && <span className="block text-ember-700">Upload refused: {problem}</span>}
        </figcaption>
      )}
    </figure>
  );
}

const navigatorOffline = () => typeof navigator !== 'undefined' && !navigator.onLine;
