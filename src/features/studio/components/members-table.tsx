import { useState } from 'react';
import type { Member } from '@shared/contracts/studio';
import { MemberRow } from './member-row';
import type { Notice } from './notice';
import { NoticeArea } from './notice-area';
import { RemoveMemberDialog } from './remove-member-dialog';

type MembersTableProps = { members: Member[]; myUserId: string; studioName: string; canManage: boolean };

export function MembersTable({ members, myUserId, studioName, canManage }: MembersTableProps) {
  const [notice, setNotice] = useState<Notice | null>(null);
  const [removing, setRemoving] = useState<Member | null>(null);

  return (
    <div className="flex flex-col gap-4">
      <NoticeArea notice={notice} />
      <div className="overflow-x-auto">
        <table className="w-full min-w-[36rem] border-collapse">
          <caption className="sr-only">Members of {studioName}</caption>
          <thead>
            <tr className="text-left text-sm text-ink-soft">
              <th scope="col" className="pb-2 font-semibold">
                Person
              </th>
              <th scope="col" className="pb-2 font-semibold">
                Role
              </th>
              <th scope="col" className="pb-2 font-semibold">
                Joined
              </th>
              {canManage && (
                <th scope="col" className="pb-2">
                  <span className="sr-only">Remove</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {members.map((member) => (
              <MemberRow
                key={member.userId}
                member={member}
                isYou={member.userId === myUserId}
                isLastOwner={member.role === 'owner' && members.filter((m) => m.role === 'owner').length === 1}
                canManage={canManage}
                onNotice={setNotice}
                onRemove={(chosen) => {
                  setNotice(null);
                  setRemoving(chosen);
                }}
              />
            ))}
          </tbody>
        </table>
      </div>
      <RemoveMemberDialog
        member={removing}
        isYou={removing?.userId === myUserId}
        studioName={studioName}
        onClose={() => setRemoving(null)}
        onRemoved={(member) => {
          setRemoving(null);
          setNotice({
            tone: 'ok',
            focus: true,
            text: member.userId === myUserId ? `You left ${studioName}.` : `${member.name} was removed from ${studioName}.`,
          });
        }}
      />
    </div>
  );
}
