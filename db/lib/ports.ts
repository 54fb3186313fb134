import net from "node:net";
import { StartupError } from "./fail";

/** Resolves when nothing listens on 127.0.0.1:port; otherwise throws a message naming the fix. */
export async function assertPortFree(port: number, what: string, envName: string): Promise<void> {
  const free = await new Promise<boolean>((resolve) => {
    const server = net.createServer();
    server.once("error", () => resolve(false));
    server.listen(port, "127.0.0.1", () => server.close(() => resolve(true)));
  });
  if (!free) {
    throw new StartupError(
      `port ${port} (${what}) is already in use on 127.0.0.1: stop the program using it ` +
        `(see \`ss -ltnp | grep :${port}\`) or choose another port with ${envName}=<port>.`,
    );
  }
}

/** A port the OS says is free right now, for throwaway test services. */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}
