// The photo formats Ribbonry takes, named one way everywhere: the show page, the photo step, the
// uploader's own check and the server's refusal. Client-safe; which of them the server can open
// now (HEIC needs a decoder) is decided by `acceptedPhotoFormats` in storage/photo-processing.ts.

export type PhotoFormat = { label: string; types: readonly string[]; extensions: readonly string[] };

export const PHOTO_FORMATS: readonly PhotoFormat[] = [
  { label: "JPEG", types: ["image/jpeg"], extensions: ["jpg", "jpeg"] },
  { label: "PNG", types: ["image/png"], extensions: ["png"] },
  { label: "WebP", types: ["image/webp"], extensions: ["webp"] },
  { label: "HEIC", types: ["image/heic", "image/heif"], extensions: ["heic", "heif"] },
];

/** "JPEG, PNG, WebP or HEIC" */
export function photoFormatWords(labels: readonly string[]): string {
  if (labels.length <= 1) return labels[0] ?? "";
  return `${labels.slice(0, -1).join(", ")} or ${labels[labels.length - 1]}`;
}

/** The content types of the given formats, e.g. for an <input accept>. */
export function photoFormatTypes(labels: readonly string[]): string[] {
  return PHOTO_FORMATS.filter((f) => labels.includes(f.label)).flatMap((f) => [...f.types]);
}

/** The content type of a chosen file among the given formats (by its type, else its extension), or null. */
export function photoFormatTypeOf(file: { type: string; name: string }, labels: readonly string[]): string | null {
  const formats = PHOTO_FORMATS.filter((f) => labels.includes(f.label));
  if (file.type) return formats.some((f) => f.types.includes(file.type)) ? file.type : null;
  const ext = file.name.split(".").pop()?.toLowerCase() ?? "";
  return formats.find((f) => f.extensions.includes(ext))?.types[0] ?? null;
}
