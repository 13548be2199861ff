"use client";
// Uploading a receipt or photo from the purchase form, with progress; apart
// from ./api so pages that upload nothing do not carry it.
import type { ApiErrorBody } from "@/lib/errors";
import { ApiError } from "./api";

/** Uploads one file with progress (fetch cannot report upload progress; XMLHttpRequest can). */
export function uploadFile(
  url: string,
  file: File,
  fields: Record<string, string>,
  onProgress: (fraction: number) => void,
): Promise<{ attachment: { id: string; fileName: string; mimeType: string; sizeBytes: number } }> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, "network", "The upload was interrupted. Try again."));
    xhr.onload = () => {
      const body = xhr.response as (ApiErrorBody & { attachment?: never }) | { attachment: { id: string; fileName: string; mimeType: string; sizeBytes: number } } | null;
      if (xhr.status >= 200 && xhr.status < 300 && body && "attachment" in body) {
        onProgress(1);
        resolve(body as { attachment: { id: string; fileName: string; mimeType: string; sizeBytes: number } });
      } else {
        const e = (body as ApiErrorBody | null)?.error;
        reject(new ApiError(xhr.status, e?.code ?? "internal", e?.message ?? `The upload failed (${xhr.status}).`, e?.fields ?? {}));
      }
    };
    const form = new FormData();
    form.set("file", file);
    for (const [k, v] of Object.entries(fields)) form.set(k, v);
    xhr.send(form);
  });
}
