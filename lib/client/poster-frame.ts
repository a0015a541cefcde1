/**
 * A poster frame for a video file, captured in the browser: seek a hidden <video> to a moment near
 * the start, draw it on a canvas 320 px wide and keep it as a small JPEG data URL. Resolves null when
 * the browser cannot decode the file (the form check is still created, just without a picture).
 */
export async function capturePosterFrame(file: Blob, width = 320): Promise<string | null> {
  const url = URL.createObjectURL(file);
  const video = document.createElement("video");
  video.muted = true;
  video.playsInline = true;
  video.preload = "auto";
  video.src = url;
  try {
    await waitFor(video, "loadeddata");
    const duration = Number.isFinite(video.duration) ? video.duration : 1;
    video.currentTime = Math.min(0.5, duration / 2);
    await waitFor(video, "seeked");
    if (!video.videoWidth || !video.videoHeight) return null;
    const canvas = document.createElement("canvas");
    canvas.width = width;
    canvas.height = Math.round((video.videoHeight / video.videoWidth) * width);
    canvas.getContext("2d")?.drawImage(video, 0, 0, canvas.width, canvas.height);
    const dataUrl = canvas.toDataURL("image/jpeg", 0.7);
    return dataUrl.startsWith("data:image/jpeg;base64,") ? dataUrl : null;
  } catch {
    return null;
  } finally {
    video.removeAttribute("src");
    video.load();
    URL.revokeObjectURL(url);
  }
}

function waitFor(video: HTMLVideoElement, event: "loadeddata" | "seeked", timeoutMs = 5000): Promise<void> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`${event} timed out`)), timeoutMs);
    video.addEventListener(event, () => (clearTimeout(timer), resolve()), { once: true });
    video.addEventListener("error", () => (clearTimeout(timer), reject(new Error("cannot decode"))), { once: true });
  });
}
