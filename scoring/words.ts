// Plain-words helpers shared by the pure modules and the app's messages.

/** 1 → "1 entry", 3 → "3 entries" (give the plural when it is not the word plus "s"). */
export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
