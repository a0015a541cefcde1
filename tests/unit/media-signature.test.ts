import { describe, expect, it } from "vitest";
import { extensionOf, matchesDeclaredType } from "@/lib/server/storage/media-signature";
import { displayFileName, formatMoment } from "@/lib/validation/form-checks";

const bytes = (...parts: (number[] | string)[]) =>
  new Uint8Array(parts.flatMap((part) => (typeof part === "string" ? [...Buffer.from(part, "latin1")] : part)));

// File signatures: ISO/IEC 14496-12 (ISO base media file format: `ftyp` box at offset 4, major brand
// after it), ISO/IEC 23008-12 (HEIF brands heic, heix, mif1), Matroska/WebM EBML magic 1A 45 DF A3
// (RFC 8794), JPEG SOI FF D8 FF (ITU-T T.81), PNG 89 50 4E 47 0D 0A 1A 0A (RFC 2083 §3.1).
describe("leading-byte checks for declared media types", () => {
  const mp4 = bytes([0, 0, 0, 0x20], "ftypisom", [0, 0, 2, 0]);
  const mov = bytes([0, 0, 0, 0x14], "ftypqt  ", [0, 0, 0, 0]);
  const heic = bytes([0, 0, 0, 0x18], "ftypheic", [0, 0, 0, 0]);
  const mif1 = bytes([0, 0, 0, 0x18], "ftypmif1", [0, 0, 0, 0]);
  const webm = bytes([0x1a, 0x45, 0xdf, 0xa3, 0x9f, 0x42, 0x86, 0x81]);
  const jpeg = bytes([0xff, 0xd8, 0xff, 0xe0, 0, 0x10], "JFIF");
  const png = bytes([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

  it.each([
    ["video/mp4", mp4],
    ["video/quicktime", mov],
    ["video/webm", webm],
    ["image/jpeg", jpeg],
    ["image/png", png],
    ["image/heic", heic],
    ["image/heic", mif1],
  ] as const)("accepts a real %s header", (type, head) => {
    expect(matchesDeclaredType(type, head)).toBe(true);
  });

  it.each([
    ["video/mp4", png],
    ["video/mp4", heic],
    ["video/webm", mp4],
    ["image/jpeg", png],
    ["image/png", jpeg],
    ["image/heic", mp4],
    ["video/quicktime", bytes("ftyp")],
    ["image/jpeg", bytes([0xff, 0xd8])],
    ["video/webm", new Uint8Array()],
  ] as const)("refuses %s when the bytes say otherwise", (type, head) => {
    expect(matchesDeclaredType(type, head)).toBe(false);
  });

  it("names final files by the checked type", () => {
    expect(extensionOf("video/quicktime")).toBe("mov");
    expect(extensionOf("image/jpeg")).toBe("jpg");
  });
});

describe("display helpers", () => {
  it("keeps only the last path part of a file name and drops control and direction characters", () => {
    expect(displayFileName("../../etc/passwd")).toBe("passwd");
    expect(displayFileName("C:\\Users\\me\\clip.mov")).toBe("clip.mov");
    expect(displayFileName("evil\u202Egpj.exe")).toBe("evilgpj.exe");
    expect(displayFileName("...hidden")).toBe("hidden");
    expect(displayFileName("a/")).toBeNull();
    expect(displayFileName(undefined)).toBeNull();
    expect(displayFileName("x".repeat(300))).toHaveLength(120);
  });

  it("formats a moment as mm:ss", () => {
    expect(formatMoment(2.04)).toBe("00:02");
    expect(formatMoment(75.9)).toBe("01:15");
    expect(formatMoment(-1)).toBe("00:00");
  });
});
