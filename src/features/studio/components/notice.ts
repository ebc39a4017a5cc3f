import type { StatusTone } from '../../../components/ui/status-message';

// `focus` is for results whose button has just disappeared (a removed row, a withdrawn
// invitation): focus goes to the message instead of falling back to the page.
export type Notice = { tone: StatusTone; text: string; focus?: boolean };
