/**
 * A request to the client that many events may ask for (a diagnostics or inlay-hint refresh)
 * sent at most once per pause: asks within `delayMs` of the first become one request, and asks
 * while it is in flight become one more request after its answer. Without this, every finished
 * evaluation sent its own refresh and they piled up in the client.
 */
export function coalescedRequest(send: () => Promise<unknown>, delayMs: number): () => void {
  let timer: NodeJS.Timeout | undefined;
  let inFlight = false;
  let askedAgain = false;
  const fire = (): void => {
    timer = undefined;
    inFlight = true;
    void send()
      .catch(() => undefined)
      .finally(() => {
        inFlight = false;
        if (askedAgain) {
          askedAgain = false;
          ask();
        }
      });
  };
  const ask = (): void => {
    if (inFlight) askedAgain = true;
    // Not pushed back by later asks, so a steady stream of them still gets a refresh out.
    else timer ??= setTimeout(fire, delayMs);
  };
  return ask;
}
