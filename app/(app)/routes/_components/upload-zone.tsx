"use client";

import { useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { cx } from "@/components/ui/cx";
import type { UnitSystem } from "@/lib/units";
import { PreviewCard } from "./preview-card";

const MAX_BYTES = 20 * 1024 * 1024;

interface Dropped {
  key: string;
  file: File;
}

function rejectionMessage(r: FileRejection): string {
  const code = r.errors[0]?.code;
  if (code === "file-too-large") return "is larger than 20 MB, the most Fadeline reads.";
  if (code === "file-invalid-type") return "is not a .gpx file.";
  return r.errors[0]?.message ?? "cannot be used.";
}

/** Drag-and-drop or pick several GPX files; each gets a preview card and is saved on its own. */
export function UploadZone({ organisationId, unitSystem }: { organisationId: string; unitSystem: UnitSystem }) {
  const [files, setFiles] = useState<Dropped[]>([]);
  const [rejected, setRejected] = useState<string[]>([]);
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    accept: { "application/gpx+xml": [".gpx"] },
    maxSize: MAX_BYTES,
    multiple: true,
    noClick: true,
    onDrop: (accepted, rejections) => {
      setFiles((current) => [...accepted.map((file) => ({ key: `${file.name}-${file.size}-${file.lastModified}-${Math.random()}`, file })), ...current]);
      setRejected(rejections.map((r) => `${r.file.name} ${rejectionMessage(r)}`));
    },
  });
  return (
    <section aria-label="Upload routes" className="space-y-4">
      <div
        {...getRootProps()}
        data-testid="upload-zone"
        className={cx(
          "flex flex-col items-center gap-2 rounded-[var(--radius-card)] border-2 border-dashed px-6 py-8 text-center transition-colors",
          isDragActive ? "border-pine-600 bg-pine-50" : "border-line-strong bg-surface",
        )}
      >
        <input {...getInputProps()} aria-label="GPX files" />
        <p className="font-medium">{isDragActive ? "Drop the files to read them" : "Drop GPX files here"}</p>
        <p className="text-sm text-ink-muted">Tracks or planned routes with elevation, up to 20 MB each. Nothing is saved until you say so.</p>
        <button type="button" onClick={open} className="mt-1 rounded-lg border border-line-strong px-3 py-1.5 text-sm font-medium hover:bg-sunken">
          Choose files…
        </button>
      </div>
      {rejected.length > 0 && (
        <ul role="alert" className="space-y-1 text-sm text-danger-600">
          {rejected.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      )}
      {files.length > 0 && (
        <div className="grid gap-3 md:grid-cols-2">
          {files.map((f) => (
            <PreviewCard
              key={f.key}
              file={f.file}
              organisationId={organisationId}
              unitSystem={unitSystem}
              onDismiss={() => setFiles((current) => current.filter((x) => x.key !== f.key))}
            />
          ))}
        </div>
      )}
    </section>
  );
}
