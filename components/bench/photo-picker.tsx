'use client';

import { useRef, useState } from 'react';
import { newId } from '@/lib/ids';
import { preparePhoto, PhotoPickError, type PreparedPhoto } from '@/lib/photos/prepare-photo';

export interface PickedPhoto extends PreparedPhoto {
  id: string;
  caption: string;
  takenAt: string;
  fileName: string;
}

export interface PhotoPickerProps {
  onPicked: (photo: PickedPhoto) => void;
  disabled?: boolean;
}

/**
 * Take a photo with the tablet's camera (a file input with `capture`) or choose image files. Each
 * is checked by content, resized and compressed here, before anything is kept; a refused file gets
 * a message naming it and nothing is saved.
 */
export function PhotoPicker({ onPicked, disabled }: PhotoPickerProps) {
  const camera = useRef<HTMLInputElement>(null);
  const files = useRef<HTMLInputElement>(null);
  const [errors, setErrors] = useState<string[]>([]);
  const [busy, setBusy] = useState(false);

  async function take(list: FileList | null, input: HTMLInputElement | null) {
    if (!list || list.length === 0) return;
    setBusy(true);
    const problems: string[] = [];
    for (const file of Array.from(list)) {
      try {
        const prepared = await preparePhoto(file);
        onPicked({ ...prepared, id: newId(), caption: '', takenAt: new Date(file.lastModified || Date.now()).toISOString(), fileName: file.name });
      } catch (error) {
        problems.push(`${file.name || 'Photo'}: ${error instanceof PhotoPickError ? error.message : 'this file could not be read as a photo.'}`);
      }
    }
    setErrors(problems);
    setBusy(false);
    if (input) input.value = '';
  }

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-quiet" onClick={() => camera.current?.click()} disabled={disabled || busy}>
          Take photo
        </button>
        <button type="button" className="btn-quiet" onClick={() => files.current?.click()} disabled={disabled || busy}>
          Choose image files
        </button>
        {busy && <span className="self-center text-sm text-ink-soft">Resizing…</span>}
      </div>
      <input ref={camera} type="file" accept="image/*" capture="environment" className="sr-only" tabIndex={-1} aria-label="Photo from the camera" onChange={(e) => void take(e.currentTarget.files, e.currentTarget)} />
      <input ref={files} type="file" accept="image/jpeg,image/png,image/webp" multiple className="sr-only" tabIndex={-1} aria-label="Photo files" onChange={(e) => void take(e.currentTarget.files, e.currentTarget)} />
      {errors.length > 0 && (
        <div role="alert" className="field-error space-y-1" data-testid="photo-errors">
          {errors.map((m) => (
            <p key={m}>{m}</p>
          ))}
        </div>
      )}
    </div>
  );
}
