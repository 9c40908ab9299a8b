import {
  authResponseSchema,
  csrfResponseSchema,
  meResponseSchema,
  type AuthResponse,
  type MeResponse,
  type SignInRequest,
  type SignUpRequest,
} from '@shared/api';
import { z } from 'zod';
import type { ChangePasswordRequest, PasswordResetConfirm, PasswordResetRequest } from '@shared/api';
import type { Http } from './http';

const csrfTokenReplySchema = z.object({ csrfToken: z.string() });

export function createAuthApi(http: Http) {
  return {
    /** Creates an anonymous session when there is none, so sign-in and sign-up can carry a token. */
    csrf: async (): Promise<string> => (await http.get('/auth/csrf', csrfResponseSchema)).token,
    me: (): Promise<MeResponse> => http.get('/auth/me', meResponseSchema),
    signIn: (body: SignInRequest): Promise<AuthResponse> => http.post('/auth/signin', body, authResponseSchema),
    signUp: (body: SignUpRequest): Promise<AuthResponse> => http.post('/auth/signup', body, authResponseSchema),
    signOut: (): Promise<void> => http.post('/auth/signout', undefined, null),
    requestReset: (body: PasswordResetRequest): Promise<void> => http.post('/auth/password-reset', body, null),
    confirmReset: (body: PasswordResetConfirm): Promise<void> => http.post('/auth/password-reset/confirm', body, null),
    changePassword: async (body: ChangePasswordRequest): Promise<string> => (await http.post('/auth/password', body, csrfTokenReplySchema)).csrfToken,
  };
}
