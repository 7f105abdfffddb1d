import { useEffect, useState } from 'react';
import { fetchObjectUrl } from '@/modules/exchange/utils/authorizedHttp';

export type ObjectUrlState = { url: string | null; error: unknown };

/**
 * A download URL fetched with the bearer token into an object URL an `<img>` can show (the
 * browser cannot add the token to an image request itself). The object URL is revoked when the
 * source changes or the component goes away.
 */
export function useAttachmentObjectUrl(source: string | null): ObjectUrlState {
  const [state, setState] = useState<ObjectUrlState & { source: string | null }>({ url: null, error: null, source: null });
  useEffect(() => {
    if (!source) return;
    let cancelled = false;
    let created: string | null = null;
    fetchObjectUrl(source).then(
      (url) => {
        if (cancelled) URL.revokeObjectURL(url);
        else {
          created = url;
          setState({ url, error: null, source });
        }
      },
      (error: unknown) => {
        if (!cancelled) setState({ url: null, error, source });
      },
    );
    return () => {
      cancelled = true;
      if (created) URL.revokeObjectURL(created);
    };
  }, [source]);
  // A state left from an earlier source is not shown for the new one.
  return state.source === source ? { url: state.url, error: state.error } : { url: null, error: null };
}
