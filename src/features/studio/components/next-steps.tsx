import { Link } from 'react-router-dom';
import { can, type StudioRole } from '@shared/auth/permissions';

type NextStep = { to: string; title: string; detail: string };

// What a person can usefully do from here, in the order a new studio tends to do it.
export function nextStepsFor(role: StudioRole | null): NextStep[] {
  const steps: NextStep[] = [];
  if (can(role, 'originals.import')) {
    steps.push({ to: '/originals', title: 'Bring in an original', detail: 'Upload a layered PSD and cut its layers into motifs.' });
  }
  if (can(role, 'studio.read')) {
    steps.push({ to: '/library', title: 'Browse the library', detail: 'Find motifs by tag, colour or the original they came from.' });
  }
  if (can(role, 'products.compose')) {
    steps.push({ to: '/products', title: 'Put motifs on a product', detail: 'Choose a template, place motifs and check print readiness.' });
  } else if (can(role, 'reviews.decide')) {
    steps.push({ to: '/products', title: 'Review products', detail: 'Look at previews, comment, and approve or ask for changes.' });
  }
  if (can(role, 'members.manage')) {
    steps.push({ to: '/members', title: 'Invite your team', detail: 'Add editors who compose and reviewers who approve.' });
  }
  return steps;
}

export function NextSteps({ role }: { role: StudioRole | null }) {
  const steps = nextStepsFor(role);
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {steps.map((step) => (
        <li key={step.to + step.title}>
          <Link
            to={step.to}
            className="group flex h-full flex-col gap-1 rounded-lg border border-sand bg-paper px-5 py-4 shadow-paper hover:border-tide"
          >
            <span className="flex items-center justify-between gap-2 font-semibold text-tide-deep">
              {step.title}
              <span aria-hidden="true" className="transition-transform group-hover:translate-x-0.5">
                →
              </span>
            </span>
            <span className="text-ink-soft">{step.detail}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
