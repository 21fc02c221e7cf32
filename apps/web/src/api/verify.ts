import { useQuery } from '@tanstack/react-query';
import { apiFetch } from './client';
import type { PackageVerifyResult, VerifyResult } from '@hoopline/contract';

/** The public verify answer for a code as typed (the server ignores dashes and case). */
export function useVerify(code: string) {
  return useQuery({
    queryKey: ['verify', code],
    queryFn: () => apiFetch<VerifyResult>(`/verify/${encodeURIComponent(code)}`),
    enabled: code !== '',
    // An answer may change (a later countersign supersedes it): ask again on every visit.
    staleTime: 0,
  });
}

/** The public answer for a package code (PKG-xxxx-xxxx-xxxx). */
export function useVerifyPackage(code: string) {
  return useQuery({
    queryKey: ['verify', 'package', code],
    queryFn: () => apiFetch<PackageVerifyResult>(`/verify/packages/${encodeURIComponent(code)}`),
    enabled: code !== '',
    staleTime: 0,
  });
}
