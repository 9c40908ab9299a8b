import {
  authResponseSchema,
  csrfResponseSchema,
  meResponseSchema,
  type AuthResponse,
  type MeResponse,
  type SignInRequest,
  type SignUpRequest,
} from '@shared/api';
import type { Http } from './http';

export function createAuthApi(http: Http) {
  return {
    /** Creates an anonymous session when there is none, so sign-in and sign-up can carry a token. */
    csrf: async (): Promise<string> => (await http.get('/auth/csrf', csrfResponseSchema)).token,
    me: (): Promise<MeResponse> => http.get('/auth/me', meResponseSchema),
    signIn: (body: SignInRequest): Promise<AuthResponse> => http.post('/auth/signin', body, authResponseSchema),
    signUp: (body: SignUpRequest): Promise<AuthResponse> => http.post('/auth/signup', body, authResponseSchema),
    signOut: (): Promise<void> => http.post('/auth/signout', undefined, null),
  };
}
