"use client";

import { useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { formatDistance, formatElevation, type UnitSystem } from "@/lib/units";
import { ApiError } from "@/lib/client/api";
import { previewGpx, type GpxPreview } from "./gpx-preview";
import { routesKey } from "./routes-view";
import { uploadFile, type UploadResult } from "./upload-request";

type State =
  | { step: "reading" }
  | { step: "unreadable"; message: string }
  | { step: "ready"; preview: GpxPreview }
  | { step: "sending"; preview: GpxPreview; sent: number }
  | { step: "saved"; result: UploadResult }
  | { step: "refused"; preview: GpxPreview | null; messages: string[] };

/** One dropped file: its preview, then its upload and the server's verdict. */
export function PreviewCard({
  file,
  organisationId,
  unitSystem,
  onDismiss,
}: {
  file: File;
  organisationId: string;
  unitSystem: UnitSystem;
  onDismiss: () => void;
}) {
  const queryClient = useQueryClient();
  const [state, setState] = useState<State>({ step: "reading" });
  const [trackId, setTrackId] = useState<string | null>(null);

  useEffect(() => {
    let cancelled = false;
    file
      .text()
      .then(previewGpx)
      .then((preview) => !cancelled && (setState({ step: "ready", preview }), setTrackId(preview.tracks[0]?.id ?? null)))
      .catch((e: unknown) => !cancelled && setState({ step: "unreadable", message: e instanceof Error ? e.message : "This file cannot be read." }));
    return () => {
      cancelled = true;
    };
  }, [file]);

  const save = async (preview: GpxPreview) => {
    setState({ step: "sending", preview, sent: 0 });
    const params = new URLSearchParams({ fileName: file.name, ...(trackId ? { trackId } : {}) });
    try {
      const result = await uploadFile(`/api/organisations/${organisationId}/routes?${params}`, file, (sent) =>
        setState((s) => (s.step === "sending" ? { ...s, sent } : s)),
      );
      setState({ step: "saved", result });
      void queryClient.invalidateQueries({ queryKey: routesKey(organisationId) });
    } catch (error) {
      const messages = error instanceof ApiError && error.fields.file?.length ? error.fields.file : [(error as Error).message];
      setState({ step: "refused", preview, messages });
    }
  };

  const chosen = "preview" in state && state.preview ? state.preview.tracks.find((t) => t.id === trackId) ?? state.preview.tracks[0] : undefined;
  return (
    <article className="space-y-3 rounded-[var(--radius-card)] border border-line bg-surface p-4" data-testid="preview-card" aria-label={`File ${file.name}`}>
      <header className="flex items-start justify-between gap-3">
        <div className="min-w-0">
          <h3 className="truncate font-semibold">{file.name}</h3>
          <p className="text-xs text-ink-muted">{(file.size / 1024).toFixed(0)} KB</p>
        </div>
        <Button size="sm" variant="ghost" onClick={onDismiss} aria-label={`Dismiss ${file.name}`}>
          Dismiss
        </Button>
      </header>
      {state.step === "reading" && <p className="text-sm text-ink-muted">Reading the file…</p>}
      {state.step === "unreadable" && <Notice tone="danger">{state.message}</Notice>}
      {chosen && state.step !== "saved" && (
        <>
          {"preview" in state && state.preview && state.preview.tracks.length > 1 && (
            <label className="block text-sm">
              <span className="font-medium">This file has {state.preview.tracks.length} tracks; model </span>
              <select value={trackId ?? ""} onChange={(e) => setTrackId(e.target.value)} className="mt-1 h-9 w-full rounded-lg border border-line-strong bg-surface px-2" disabled={state.step === "sending"}>
                {state.preview.tracks.map((t) => (
                  <option key={t.id} value={t.id}>
                    {t.name} ({formatDistance(t.lengthM, unitSystem)})
                  </option>
                ))}
              </select>
            </label>
          )}
          <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm" data-testid="preview-figures">
            <dt className="text-ink-muted">Track</dt>
            <dd className="truncate">{chosen.name}</dd>
            <dt className="text-ink-muted">Points</dt>
            <dd>{chosen.points.toLocaleString("en")}</dd>
            <dt className="text-ink-muted">Length</dt>
            <dd>{formatDistance(chosen.lengthM, unitSystem)}</dd>
            <dt className="text-ink-muted">Ascent / descent</dt>
            <dd>{chosen.ascentM === null ? "no elevation" : `${formatElevation(chosen.ascentM, unitSystem)} / ${formatElevation(chosen.descentM ?? 0, unitSystem)}`}</dd>
          </dl>
          <p className="text-xs text-ink-muted">Quick look from the raw points; saving cleans and smooths the track first.</p>
        </>
      )}
      {state.step === "ready" && <Button onClick={() => save(state.preview)}>Save route</Button>}
      {state.step === "sending" && (
        <div className="space-y-1">
          <div className="h-2 overflow-hidden rounded-full bg-sunken" role="progressbar" aria-label="Upload" aria-valuenow={Math.round(state.sent * 100)} aria-valuemin={0} aria-valuemax={100}>
            <div className="h-full bg-pine-600 transition-[width]" style={{ width: `${Math.max(4, state.sent * 100)}%` }} />
          </div>
          <p className="text-xs text-ink-muted">{state.sent < 1 ? `Sending… ${Math.round(state.sent * 100)} %` : "Finding the descents…"}</p>
        </div>
      )}
      {state.step === "refused" && (
        <Notice tone="danger" title="Not saved">
          <ul className="list-disc space-y-0.5 pl-4">
            {state.messages.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
        </Notice>
      )}
      {state.step === "saved" && (
        <Notice tone={state.result.duplicate ? "caution" : "info"} title={state.result.duplicate ? "Already uploaded" : "Saved"}>
          {state.result.duplicate ? "This file is already a route of this organisation: " : "Saved as "}
          <Link href={`/routes/${state.result.route.id}`} className="font-medium underline">
            {state.result.route.name}
          </Link>
          .{state.result.warnings.length > 0 && <span className="mt-1 block text-xs">{state.result.warnings.length} note(s) about the file are on the route page.</span>}
        </Notice>
      )}
    </article>
  );
}
