import { useNavigation } from 'react-router-dom';

export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div className="fixed inset-x-0 top-0 z-40 h-1 overflow-hidden bg-tide/15" aria-hidden="true">
      <div className="h-full w-2/5 animate-progress bg-tide" />
    </div>
  );
}
