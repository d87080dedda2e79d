// Shared by the benches that start `next start`: wait until the server answers.

/** Resolves once `url` answers 2xx; gives up after a minute. */
export async function waitForServer(url: string) {
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      /* starting */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no answer from ${url}`);
}
