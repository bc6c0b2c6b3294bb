// A tiny hash router: "#/line/abc/span/def" → { name: 'span', params: { lineId: 'abc', spanId: 'def' } }.
// Hash routes keep every screen reachable offline from the one precached index.html.
import { useEffect, useState } from 'preact/hooks';

export type RouteName =
  | 'lines'
  | 'line'
  | 'line-settings'
  | 'line-report'
  | 'section'
  | 'span'
  | 'new-reading'
  | 'result'
  | 'conductors';

export interface Route {
  name: RouteName;
  params: Record<string, string>;
  query: URLSearchParams;
}

const PATTERNS: [RouteName, string][] = [
  ['lines', ''],
  ['conductors', 'conductors'],
  ['line', 'line/:lineId'],
  ['line-settings', 'line/:lineId/settings'],
  ['line-report', 'line/:lineId/report'],
  ['section', 'line/:lineId/section/:sectionId'],
  ['span', 'line/:lineId/span/:spanId'],
  ['new-reading', 'line/:lineId/span/:spanId/reading'],
  ['result', 'line/:lineId/reading/:readingId'],
];

/** Matches a hash such as "#/line/abc?x=1" against the route table; unknown paths go to the lines list. */
export function parseHash(hash: string): Route {
  const withoutMark = hash.replace(/^#\/?/, '');
  const [path = '', search = ''] = withoutMark.split('?');
  const parts = path.split('/').filter((part) => part !== '');
  for (const [name, pattern] of PATTERNS) {
    const wanted = pattern.split('/').filter((part) => part !== '');
    if (wanted.length !== parts.length) continue;
    const params: Record<string, string> = {};
    const matches = wanted.every((segment, index) => {
      const actual = parts[index] ?? '';
      if (segment.startsWith(':')) {
        params[segment.slice(1)] = decodeURIComponent(actual);
        return true;
      }
      return segment === actual;
    });
    if (matches) return { name, params, query: new URLSearchParams(search) };
  }
  return { name: 'lines', params: {}, query: new URLSearchParams() };
}

/** Builds a hash link from path segments, encoding each one. */
export function href(...segments: string[]): string {
  return '#/' + segments.map((segment) => encodeURIComponent(segment)).join('/');
}

export function navigate(target: string): void {
  window.location.hash = target.replace(/^#/, '');
}

/** The current route, updated on every hash change. */
export function useRoute(): Route {
  const [route, setRoute] = useState(() => parseHash(window.location.hash));
  useEffect(() => {
    const onChange = (): void => {
      setRoute(parseHash(window.location.hash));
      window.scrollTo(0, 0);
    };
    window.addEventListener('hashchange', onChange);
    return () => window.removeEventListener('hashchange', onChange);
  }, []);
  return route;
}
