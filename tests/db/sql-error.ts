// Drizzle wraps driver errors ("Failed query: ..."); SQLite's own message is in `cause`.
export async function sqlErrorOf(statement: PromiseLike<unknown>): Promise<string> {
  try {
    await statement;
  } catch (error) {
    const messages: string[] = [];
    for (let e: unknown = error; e instanceof Error; e = e.cause) messages.push(e.message);
    return messages.join("\n");
  }
  throw new Error("expected the statement to fail, but it succeeded");
}
