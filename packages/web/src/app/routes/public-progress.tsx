import { useParams } from 'react-router-dom';
import { PublicProgress } from '@/features/campaign-progress/components/public-progress';

/** The shareable campaign page: open to anyone with the link, signed in or not. */
export function PublicProgressRoute() {
  const code = useParams().code ?? '';
  return <PublicProgress code={code} />;
}
