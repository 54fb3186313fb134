import { headers } from "next/headers";
import { clientAddress } from "./forwarded";

export { PEER_HEADER, clientAddress, servedOverHttps } from "./forwarded";

/** The caller's address for the current request (see clientAddress). */
export async function requestIp(): Promise<string> {
  return clientAddress(await headers());
}
