import "server-only";
/**
 * What a service receives as its input: a thunk, so the service reads the body only after its
 * access checks (a wrong role is a 403 whatever was sent, even a body that is not JSON). Route
 * handlers pass `() => readJson(request)`, server actions `() => fieldsFrom(form)`.
 */
export type Body = () => unknown | Promise<unknown>;
