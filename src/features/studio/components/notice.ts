import type { StatusTone } from '../../../components/ui/status-message';

export type Notice = { tone: StatusTone; text: string };
