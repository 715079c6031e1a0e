"use client";

import { ApiError } from "@/lib/client/api";

export interface UploadResult {
  duplicate: boolean;
  route: { id: string; name: string };
  warnings: string[];
}

/**
 * Sends one file as the request body with XMLHttpRequest, which (unlike fetch) reports upload progress.
 * `onProgress` gets the share sent, 0–1; once all is sent the server reads the file, shown as "processing".
 */
export function uploadFile(url: string, file: File, onProgress: (sent: number) => void): Promise<UploadResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.setRequestHeader("content-type", "application/gpx+xml");
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onerror = () => reject(new ApiError(0, "network", "The upload was interrupted. Check your connection and try again."));
    xhr.onload = () => {
      let body: { error?: { code: string; message: string; fields?: Record<string, string[]> } } & Partial<UploadResult> = {};
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        /* a proxy's HTML error page: handled below by the status */
      }
      if (xhr.status >= 200 && xhr.status < 300 && body.route) resolve(body as UploadResult);
      else reject(new ApiError(xhr.status, body.error?.code ?? "internal", body.error?.message ?? `The server answered ${xhr.status}.`, body.error?.fields));
    };
    xhr.send(file);
  });
}
