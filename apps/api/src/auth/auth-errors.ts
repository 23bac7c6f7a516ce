import { NotSignedInError } from '../common/not-signed-in.error.js';

export const wrongCredentials = () => new NotSignedInError('The e-mail or password is not right.');
export const sessionEnded = () => new NotSignedInError('Your session has ended; sign in again.');
