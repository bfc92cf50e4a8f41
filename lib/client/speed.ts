import type { z } from "zod";
import type {
  speedAcceptSchema,
  speedLabSettingsSchema,
  speedMeasureUploadSchema,
  speedUploadSchema,
} from "@/lib/validations/speed";
import { ApiError, OFFLINE_MESSAGE, sendJson, toApiError } from "./fetcher";
import { speedKeys } from "./keys";

// The speed lab's requests from the browser. The upload goes through XMLHttpRequest: fetch reports no upload
// progress, and the coach should see a large file going up.

export type TimingUploadResult = {
  testIds: number[];
  uploadId: number | null;
  trials: { testId: number; athleteName: string; testDate: string }[];
};

function postWithProgress<T>(url: string, body: unknown, onProgress: (share: number) => void): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.setRequestHeader("content-type", "application/json");
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, "offline", OFFLINE_MESSAGE));
    xhr.onload = () => {
      const res = new Response(xhr.responseText, {
        status: xhr.status,
        headers: { "content-type": xhr.getResponseHeader("content-type") ?? "application/json" },
      });
      if (res.ok) res.json().then((b) => resolve(b as T), reject);
      else toApiError(res).then(reject, reject);
    };
    xhr.send(JSON.stringify(body));
  });
}

export const speedApi = {
  saveSettings: (teamId: number, body: z.input<typeof speedLabSettingsSchema>) =>
    sendJson<{ retestWeeks: number }>("PATCH", speedKeys.settings(teamId), body),

  accept: (teamId: number, testId: number, body?: z.input<typeof speedAcceptSchema>) =>
    sendJson<{ entryId: number; effectiveFrom: string; replaced: boolean }>(
      "POST",
      speedKeys.accept(teamId, testId),
      body,
    ),

  /** Sends the file, calling `onProgress` with the share sent (0–1); rejects with an ApiError like sendJson. */
  uploadTiming: (teamId: number, body: z.input<typeof speedUploadSchema>, onProgress: (share: number) => void) =>
    postWithProgress<TimingUploadResult>(speedKeys.timingUploads(teamId), body, onProgress),

  /** A speed trace, force trace or contact file for one athlete, with progress like uploadTiming. */
  uploadMeasure: (
    teamId: number,
    body: z.input<typeof speedMeasureUploadSchema>,
    onProgress: (share: number) => void,
  ) => postWithProgress<{ testId: number; uploadId: number }>(speedKeys.measureUploads(teamId), body, onProgress),
};
