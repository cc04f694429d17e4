// How much one server action call may carry. next.config.ts hands it to Next.js, which refuses a
// larger body before the action runs; forms check it in the browser first so people get a plain
// message instead of a failed request (components/forms/action-form.tsx).
export const ACTION_BODY_LIMIT_BYTES = 1024 * 1024;

/**
 * Roughly what the browser will send for these values (React encodes an action's arguments much
 * like JSON), in UTF-8 bytes. Room is left for the encoding's own framing.
 */
export function tooLargeForAction(values: unknown): boolean {
  let text: string;
  try {
    text = JSON.stringify(values) ?? "";
  } catch {
    return false;
  }
  return new TextEncoder().encode(text).length > ACTION_BODY_LIMIT_BYTES - 16 * 1024;
}

export const TOO_LARGE_MESSAGE = "That was too much to send at once. Shorten the longest text and try again; nothing was saved.";
