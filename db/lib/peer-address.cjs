/**
 * Preloaded into the web server (`node --require`, set by db/lib/app-env.ts): stamps every
 * incoming request with the address of the socket it arrived on, in a header the client cannot
 * set (any copy it sent is overwritten). Next.js passes on a client's own X-Forwarded-For
 * untouched, so without this the app could not tell a real address from a made-up one; the app
 * reads it in app/_lib/request-ip.ts and trusts X-Forwarded-For only from TRUSTED_PROXIES.
 */
"use strict";
const http = require("node:http");

const HEADER = "x-pierwise-peer-address";
const emit = http.Server.prototype.emit;
http.Server.prototype.emit = function emitWithPeer(event, request, ...rest) {
  if (event === "request" && request && request.headers) {
    request.headers[HEADER] = (request.socket && request.socket.remoteAddress) || "";
  }
  return emit.call(this, event, request, ...rest);
};
