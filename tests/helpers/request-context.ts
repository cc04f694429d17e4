// The request a server action sees in integration tests (see tests/setup/next-request.ts).
export const requestContext = {
  headers: new Headers(),
  revalidated: [] as string[],
};

export function actAs(cookie: string | null): void {
  requestContext.headers = new Headers(cookie ? { cookie } : {});
}
