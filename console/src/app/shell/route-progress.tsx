import { useNavigation } from 'react-router-dom';

// Route pages load lazily; a thin bar shows that the next page is on its way.
export function RouteProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return <div className="ll-route-progress" aria-hidden="true" />;
}
