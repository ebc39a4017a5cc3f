import { useEffect, useRef } from 'react';
import { StatusMessage } from '../../../components/ui/status-message';
import type { Notice } from './notice';

export function NoticeArea({ notice }: { notice: Notice | null }) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (notice?.focus) ref.current?.focus();
  }, [notice]);
  if (!notice) return null;
  return (
    <div ref={ref} tabIndex={-1}>
      <StatusMessage tone={notice.tone}>{notice.text}</StatusMessage>
    </div>
  );
}
