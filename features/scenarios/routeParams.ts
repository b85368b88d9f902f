import { useLocalSearchParams } from 'expo-router';

/** A numeric route parameter ("/study-areas/3" → 3); NaN when it is missing or not a number. */
export function useNumericParam(name: string): number {
  const params = useLocalSearchParams<Record<string, string>>();
  const raw = params[name];
  return /^\d+$/.test(raw ?? '') ? Number(raw) : Number.NaN;
}
