import type { AreaUnit } from '@/shared/schemas';
import { useMe } from '@/features/auth/queries';

/** The signed-in person's area unit (Account → Units); hectares until it is known. */
export function useAreaUnit(): AreaUnit {
  return useMe().data?.areaUnit ?? 'ha';
}
