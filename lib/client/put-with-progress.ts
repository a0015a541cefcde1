/** Browser-side upload of a file to a presigned URL, with progress and retry when the connection drops. */

export class UploadFailed extends Error {
  constructor(
    message: string,
    readonly retryable: boolean,
  ) {
    super(message);
  }
}

function putOnce(url: string, file: Blob, headers: Record<string, string>, onProgress: (fraction: number) => void, signal?: AbortSignal) {
  return new Promise<void>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("PUT", url);
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) resolve();
      // Storage hiccups (5xx) and throttling are worth another try; a refused signature is not.
      else reject(new UploadFailed(`Storage answered ${xhr.status}.`, xhr.status >= 500 || xhr.status === 429));
    };
    xhr.onerror = () => reject(new UploadFailed("The connection dropped.", true));
    xhr.ontimeout = () => reject(new UploadFailed("The upload timed out.", true));
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.onabort = () => reject(new UploadFailed("Upload cancelled.", false));
    xhr.send(file);
  });
}

export interface PutOptions {
  headers: Record<string, string>;
  onProgress: (fraction: number) => void;
  /** Told before each retry, with the attempt number and the wait in ms. */
  onRetry?: (attempt: number, waitMs: number) => void;
  attempts?: number;
  signal?: AbortSignal;
}

/** PUTs the file, retrying dropped connections after 1 s, 2 s, 4 s… (common practice, no source). */
export async function putWithProgress(url: string, file: Blob, options: PutOptions): Promise<void> {
  const attempts = options.attempts ?? 4;
  for (let attempt = 1; ; attempt += 1) {
    try {
      options.onProgress(0);
      await putOnce(url, file, options.headers, options.onProgress, options.signal);
      options.onProgress(1);
      return;
    } catch (error) {
      const retryable = error instanceof UploadFailed && error.retryable;
      if (!retryable || attempt >= attempts) throw error;
      const waitMs = 1000 * 2 ** (attempt - 1);
      options.onRetry?.(attempt, waitMs);
      await new Promise((resolve) => setTimeout(resolve, waitMs));
    }
  }
}
