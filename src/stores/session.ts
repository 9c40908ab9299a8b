import { computed, ref } from 'vue';
import { defineStore } from 'pinia';
import type { ClientProject, Membership, Role, SignInRequest, SignUpRequest, User } from '@shared/api';
import { isApiError, useApi } from '@/api';

const WORKSHOP_KEY = 'slotwright.workshop';

function readStoredWorkshop(): string | null {
  try {
    return localStorage.getItem(WORKSHOP_KEY);
  } catch {
    return null;
  }
}

function storeWorkshop(id: string | null): void {
  try {
    if (id) localStorage.setItem(WORKSHOP_KEY, id);
    else localStorage.removeItem(WORKSHOP_KEY);
  } catch {
    // Private windows may refuse storage; the choice then lasts for this page only.
  }
}

/** Who is signed in, where they are a member and with which role, the chosen workshop and the CSRF token. */
export const useSessionStore = defineStore('session', () => {
  const api = useApi();

  const user = ref<User | null>(null);
  const memberships = ref<Membership[]>([]);
  /** Projects this person was let into as a client (they are no member of those workshops). */
  const clientProjects = ref<ClientProject[]>([]);
  const csrfToken = ref<string | null>(null);
  const currentWorkshopId = ref<string | null>(readStoredWorkshop());
  /** Set once the first /auth/me has answered, so guards know whether "no user" means signed out. */
  const checked = ref(false);

  const signedIn = computed(() => user.value !== null);
  const currentMembership = computed(
    () => memberships.value.find((m) => m.workshop.id === currentWorkshopId.value) ?? null,
  );
  const currentWorkshop = computed(() => currentMembership.value?.workshop ?? null);
  const currentRole = computed<Role | null>(() => currentMembership.value?.role ?? null);

  /** The role in a workshop, or 'client' in a project of it this person was let into. */
  function roleIn(workshopId: string | null | undefined, projectId?: string | null): Role | null {
    const member = memberships.value.find((m) => m.workshop.id === workshopId)?.role;
    if (member) return member;
    if (projectId && clientProjects.value.some((c) => c.project.id === projectId && c.workshop.id === workshopId)) return 'client';
    return null;
  }

  function selectWorkshop(workshopId: string | null): void {
    currentWorkshopId.value = workshopId;
    storeWorkshop(workshopId);
  }

  // Keep the chosen workshop valid: the stored one if still a member, else the first membership.
  function settleWorkshop(): void {
    if (!memberships.value.some((m) => m.workshop.id === currentWorkshopId.value)) {
      selectWorkshop(memberships.value[0]?.workshop.id ?? null);
    }
  }

  function forget(): void {
    user.value = null;
    memberships.value = [];
    clientProjects.value = [];
    csrfToken.value = null;
  }

  let pendingCheck: Promise<void> | null = null;

  /** Asks the server who is signed in. Signed out is not an error; other failures are thrown. */
  async function refresh(): Promise<void> {
    try {
      const me = await api.auth.me();
      user.value = me.user;
      memberships.value = me.memberships;
      clientProjects.value = me.clientProjects;
      csrfToken.value = me.csrfToken;
      settleWorkshop();
    } catch (error) {
      if (isApiError(error) && error.status === 401) forget();
      else throw error;
    } finally {
      checked.value = true;
    }
  }

  /** The first check, shared by everyone who asks while it runs. */
  function ensureChecked(): Promise<void> {
    if (checked.value) return Promise.resolve();
    pendingCheck ??= refresh().finally(() => {
      pendingCheck = null;
    });
    return pendingCheck;
  }

  async function refreshCsrfToken(): Promise<string | null> {
    csrfToken.value = await api.auth.csrf();
    return csrfToken.value;
  }

  async function ensureCsrfToken(): Promise<void> {
    if (!csrfToken.value) await refreshCsrfToken();
  }

  async function signIn(body: SignInRequest): Promise<void> {
    await ensureCsrfToken();
    const reply = await api.auth.signIn(body);
    // The session was regenerated on sign-in, so only the new token is good from here on.
    csrfToken.value = reply.csrfToken;
    user.value = reply.user;
    await refresh();
  }

  async function signUp(body: SignUpRequest): Promise<void> {
    await ensureCsrfToken();
    const reply = await api.auth.signUp(body);
    csrfToken.value = reply.csrfToken;
    user.value = reply.user;
    await refresh();
  }

  /** Takes over a session the server started elsewhere (accepting an invitation signs in). */
  async function adopt(reply: { user: User; csrfToken: string }): Promise<void> {
    csrfToken.value = reply.csrfToken;
    user.value = reply.user;
    await refresh();
  }

  async function signOut(): Promise<void> {
    try {
      await api.auth.signOut();
    } finally {
      forget();
    }
  }

  return {
    user,
    memberships,
    clientProjects,
    adopt,
    ensureCsrfToken,
    csrfToken,
    currentWorkshopId,
    checked,
    signedIn,
    currentMembership,
    currentWorkshop,
    currentRole,
    roleIn,
    selectWorkshop,
    forget,
    refresh,
    ensureChecked,
    refreshCsrfToken,
    signIn,
    signUp,
    signOut,
  };
});
