import type { StudioRole } from '../../../shared/auth/permissions';
import type { MembersResponse, StudioSettings } from '../../../shared/contracts/studio';
import { conflict, notFound } from '../../lib/http-error';
import type { StudioRepository } from './studio.repository';

export function createStudioService(repo: StudioRepository) {
  async function settings(studioId: string): Promise<StudioSettings> {
    const s = await repo.findStudio(studioId);
    if (!s) throw notFound('That studio');
    return { id: s.id, name: s.name, paletteLimit: s.paletteLimit, readyWeeksBeforeLaunch: s.readyWeeksBeforeLaunch, createdAt: s.createdAt.toISOString() };
  }

  async function guardLastOwner(studioId: string, userId: string, what: string) {
    const member = await repo.findMembership(studioId, userId);
    if (!member) throw notFound('That member');
    if (member.role === 'owner' && (await repo.countOwners(studioId)) <= 1) {
      throw conflict('members.last_owner', `A studio needs at least one owner: make someone else owner before you ${what}.`);
    }
    return member;
  }

  return {
    settings,
    async updateSettings(studioId: string, patch: Partial<{ name: string; paletteLimit: number; readyWeeksBeforeLaunch: number }>) {
      if (Object.keys(patch).length > 0) await repo.updateStudio(studioId, patch);
      return settings(studioId);
    },
    async members(studioId: string): Promise<MembersResponse> {
      const [members, invitations] = await Promise.all([repo.listMembers(studioId), repo.pendingInvitations(studioId)]);
      return {
        members: members.map((m) => ({ ...m, joinedAt: m.joinedAt.toISOString() })),
        invitations: invitations.map((i) => ({ ...i, createdAt: i.createdAt.toISOString(), expiresAt: i.expiresAt.toISOString() })),
      };
    },
    async changeRole(studioId: string, userId: string, role: StudioRole) {
      const member = await repo.findMembership(studioId, userId);
      if (!member) throw notFound('That member');
      if (member.role === role) return;
      if (member.role === 'owner') await guardLastOwner(studioId, userId, 'change this role');
      await repo.setRole(studioId, userId, role);
    },
    async removeMember(studioId: string, userId: string) {
      await guardLastOwner(studioId, userId, 'remove this member');
      await repo.removeMember(studioId, userId);
    },
  };
}

export type StudioService = ReturnType<typeof createStudioService>;
