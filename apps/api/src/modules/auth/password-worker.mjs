// Runs in a worker thread of the password pool (password-hash.ts): bcryptjs's synchronous calls are fastest
// here, and the API's event loop never waits on them.
import bcrypt from 'bcryptjs';

/** @param {{ password: string, cost: number }} args */
export function hash({ password, cost }) {
  return bcrypt.hashSync(password, cost);
}

/** @param {{ password: string, hash: string }} args */
export function compare({ password, hash }) {
  return bcrypt.compareSync(password, hash);
}
