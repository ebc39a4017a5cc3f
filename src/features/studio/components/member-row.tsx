import { useRef, useState } from 'react';
import { studioRoles, type StudioRole } from '@shared/auth/permissions';
import type { Member } from '@shared/contracts/studio';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Select } from '../../../components/ui/select-field';
import { VisuallyHidden } from '../../../components/ui/visually-hidden';
import { formatDay } from '../../../lib/format';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { roleNames, roleOptions } from '../../auth/components/role-words';
import { useUpdateMember } from '../api/update-member';
import type { Notice } from './notice';

type MemberRowProps = {
  member: Member;
  isYou: boolean;
  /** The studio's last owner cannot leave or step down (the server refuses); say why instead. */
  isLastOwner?: boolean;
  canManage: boolean;
  onNotice: (notice: Notice) => void;
  onRemove: (member: Member) => void;
};

// A role change is chosen, then saved: arrowing through a select must not change anyone's role.
export function MemberRow({ member, isYou, isLastOwner = false, canManage, onNotice, onRemove }: MemberRowProps) {
  // null while the select shows the saved role; a role once someone picks another one.
  const [picked, setPicked] = useState<StudioRole | null>(null);
  const [confirmingSelfDemotion, setConfirmingSelfDemotion] = useState(false);
  const selectRef = useRef<HTMLSelectElement>(null);
  // The Save button disappears once the answer is in; keep focus on this row's role.
  const settle = (notice: Notice) => {
    setPicked(null);
    onNotice(notice);
    selectRef.current?.focus();
  };
  const updateMember = useUpdateMember();
  const draft = picked ?? member.role;
  const changed = draft !== member.role;
  // Per-call callbacks run after the members list has been refetched, so the select never
  // flashes back to the old role.
  const save = () => {
    setConfirmingSelfDemotion(false);
    updateMember.mutate(
      { userId: member.userId, role: draft },
      {
        onSuccess: (_, { role }) =>
          settle({ tone: 'ok', text: `${isYou ? 'You are' : `${member.name} is`} now ${roleNames[role].toLowerCase()}.` }),
        onError: (error) => settle({ tone: 'problem', text: errorMessageOf(error) }),
      },
    );
  };

  return (
    <tr className="border-t border-sand align-middle">
      <th scope="row" className="py-3 pr-4 text-left font-normal">
        <span className="block font-semibold text-ink">
          {member.name}
          {isYou && <span className="ml-1.5 font-normal text-ink-soft">(you)</span>}
        </span>
        <span className="block text-sm wrap-anywhere text-ink-soft">{member.email}</span>
      </th>
      <td className="py-3 pr-4">
        {canManage ? (
          <div className="flex items-center gap-2">
            <Select
              ref={selectRef}
              aria-label={`Role of ${member.name}`}
              name={`role-${member.userId}`}
              value={draft}
              options={roleOptions(studioRoles)}
              onChange={(event) => setPicked(event.target.value as StudioRole)}
              className="w-36 border-sand py-1.5"
            />
            {changed && (
              <Button
                size="sm"
                busy={updateMember.isPending}
                busyLabel="Saving…"
                onClick={() => (isYou && draft !== 'owner' ? setConfirmingSelfDemotion(true) : save())}
              >
                Save<VisuallyHidden> role of {member.name}</VisuallyHidden>
              </Button>
            )}
          </div>
        ) : (
          <span className="inline-flex rounded-full border border-sand bg-shell px-2.5 py-0.5 text-sm font-semibold">
            {roleNames[member.role]}
          </span>
        )}
      </td>
      <td className="py-3 pr-4 whitespace-nowrap text-ink-soft">{formatDay(member.joinedAt)}</td>
      {canManage && (
        <td className="py-3 text-right">
          {isLastOwner ? (
            <span className="text-sm text-ink-soft">Only owner: make someone else an owner before leaving</span>
          ) : (
            <Button variant="quiet" size="sm" onClick={() => onRemove(member)}>
              {isYou ? 'Leave' : 'Remove'}
              <VisuallyHidden> {member.name}</VisuallyHidden>
            </Button>
          )}
          <Dialog
            open={confirmingSelfDemotion}
            onClose={() => setConfirmingSelfDemotion(false)}
            title={`Make yourself ${roleNames[draft].toLowerCase()}?`}
            description="You will no longer be able to invite people, change roles or change studio settings. Another owner can make you an owner again."
            actions={
              <>
                <Button variant="secondary" data-autofocus onClick={() => setConfirmingSelfDemotion(false)}>
                  Stay owner
                </Button>
                <Button variant="danger" onClick={save}>
                  Change my role
                </Button>
              </>
            }
          />
        </td>
      )}
    </tr>
  );
}
