import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { studioQueryOptions } from '../../features/studios/api.ts';

/** The studio in the URL and whether the asker may change its workbench (hosts only). */
export function useWorkbench() {
  const { slug = '' } = useParams();
  const { data: studio } = useQuery(studioQueryOptions(slug));
  return { slug, canEdit: studio?.myRole === 'host' };
}
