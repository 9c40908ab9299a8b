import type { Pinia } from 'pinia';
import type { LocationQueryValue, RouteLocationRaw, Router } from 'vue-router';
import { can } from '@shared/api';
import { useSessionStore } from '@/stores/session';

/** A same-site path to return to after signing in; anything else (another origin, junk) is ignored. */
export function safeReturnPath(value: LocationQueryValue | LocationQueryValue[] | undefined): string | null {
  const path = Array.isArray(value) ? value[0] : value;
  if (typeof path !== 'string' || !path.startsWith('/') || path.startsWith('//') || path.startsWith('/\\')) return null;
  return path;
}

/**
 * Signed-in and role checks before every page. The server refuses anything not allowed anyway; these only keep
 * people from landing on a page that could not work for them, and say why.
 */
export function installGuards(router: Router, pinia: Pinia): void {
  router.beforeEach(async (to): Promise<true | RouteLocationRaw> => {
    const session = useSessionStore(pinia);
    try {
      await session.ensureChecked();
    } catch {
      // Server unreachable: carry on signed out; the sign-in form reports the failure when used.
    }

    if (to.meta.public) {
      if (to.name === 'sign-in' && session.signedIn) return safeReturnPath(to.query.next) ?? { name: 'home' };
      return true;
    }
    if (!session.signedIn) {
      return { name: 'sign-in', query: to.fullPath === '/' ? {} : { next: to.fullPath } };
    }

    if (to.name === 'home') {
      const workshopId = session.currentWorkshopId;
      if (workshopId) return { name: 'projects', params: { workshopId } };
      const first = session.clientProjects[0];
      if (first) return { name: 'project', params: { workshopId: first.workshop.id, projectId: first.project.id } };
      return { name: 'workshops' };
    }

    const workshopId = 'workshopId' in to.params && typeof to.params.workshopId === 'string' ? to.params.workshopId : null;
    const projectId = 'projectId' in to.params && typeof to.params.projectId === 'string' ? to.params.projectId : null;
    if (workshopId) {
      let role = session.roleIn(workshopId, projectId);
      if (!role) {
        // Someone may have added this person to the workshop since the page loaded.
        await session.refresh().catch(() => undefined);
        role = session.roleIn(workshopId, projectId);
      }
      if (!role) return { name: 'forbidden', query: { reason: 'not-member' } };
      if (role !== 'client') session.selectWorkshop(workshopId);
      if (to.meta.requires && !can(role, to.meta.requires)) {
        return { name: 'forbidden', query: { need: to.meta.requires, workshop: workshopId } };
      }
    }
    return true;
  });

  router.afterEach((to) => {
    document.title = to.meta.title ? `${to.meta.title} · Slotwright` : 'Slotwright';
  });
}
