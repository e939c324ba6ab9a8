import { useEffect, useState } from 'react';
import { fetchJoinInfo, type JoinInfoResult } from '@/realtime';
import { isValidJoinCode, normaliseJoinCode } from '../utils/joinCode';

/** Join info for the code typed so far: fetched once the code is valid, dropped when it changes. */
export function useJoinInfo(rawCode: string): JoinInfoResult | null {
  const code = isValidJoinCode(rawCode) ? normaliseJoinCode(rawCode) : null;
  const [result, setResult] = useState<{ code: string; info: JoinInfoResult } | null>(null);

  useEffect(() => {
    if (!code) return;
    let current = true;
    void fetchJoinInfo(code).then((info) => {
      if (current) setResult({ code, info });
    });
    return () => {
      current = false;
    };
  }, [code]);

  return result && result.code === code ? result.info : null;
}
