// What other parts of the server may use from this domain; everything else stays inside it.
export { sessionUser, type SessionStart } from './accounts.service.ts';
export { findUserByEmail, findUserById, insertUser } from './users.repository.ts';
export { startSession } from './session-start.ts';
