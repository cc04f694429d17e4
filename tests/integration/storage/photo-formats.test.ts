// The photo formats are named one way: the show page, the entry form's photo step and the server's
// refusal of another format all read the one list the show's settings carry.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { publicShowDetails, settingsForShowId } from "@/db/queries/settings";
import { photoFormatWords } from "@/lib/photo-formats";
import { acceptedPhotoFormats, processPhoto } from "@/storage/photo-processing";
import { makeShow } from "../../helpers/factories";

describe("one list of photo formats", () => {
  it("the show page, the photo step and the refusal name the same formats", async () => {
    const show = await makeShow();
    const settings = await settingsForShowId(show.id);
    const details = await publicShowDetails(show.slug);
    expect(settings.photoFormats).toEqual(acceptedPhotoFormats());
    expect(details!.photos.photoFormats).toEqual(settings.photoFormats);
    expect(settings.photoFormats.slice(0, 3)).toEqual(["JPEG", "PNG", "WebP"]);

    const gif = await sharp({ create: { width: 1200, height: 800, channels: 3, background: "#888" } }).gif().toBuffer();
    const refused = await processPhoto(gif, { maxBytes: 5_000_000, minWidthPx: 100, minHeightPx: 100 }).then(
      () => null,
      (err: Error) => err.message,
    );
    expect(refused).toContain(`this show accepts ${photoFormatWords(settings.photoFormats)} photos`);
  });
});
