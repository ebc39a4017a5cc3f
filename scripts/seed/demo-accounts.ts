// The invented Saltmarsh Studio team (CONVENTIONS.md). Local demo sign-ins only; never a real deployment.
export type DemoRole = 'owner' | 'editor' | 'reviewer';

export interface DemoAccount {
  name: string;
  email: string;
  role: DemoRole;
}

export const demoStudioName = 'Saltmarsh Studio';

export const demoAccounts: readonly DemoAccount[] = [
  { name: 'Ines Okafor', email: 'ines@saltmarsh.test', role: 'owner' },
  { name: 'Teodor Vance', email: 'teodor@saltmarsh.test', role: 'editor' },
  { name: 'June Abara', email: 'june@saltmarsh.test', role: 'reviewer' },
];

export const demoPassword = 'saltmarsh-demo';
