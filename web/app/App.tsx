// The app shell: top bar, first-run cautions, the update offer, and the screen for the current route.
import { useEffect, useState } from 'preact/hooks';
import { LinesScreen } from '../screens/lines/LinesScreen';
import { WelcomeNotice } from '../screens/welcome/WelcomeNotice';
import { DataContext } from './context';
import type { AppData } from './data';
import { cautionsAccepted } from './prefs';
import { LazyScreen } from './lazy-screen';
import { href, useRoute, type Route } from './router';
import { registerServiceWorker, type UpdateHandle } from './sw-updates';
import { UpdateBar } from './UpdateBar';
import './app.css';

// Screens past the first are split into their own chunks (module-level loaders so each loads once).
const loadConductors = () => import('../screens/conductors/ConductorsScreen').then((m) => m.ConductorsScreen);
const loadLine = () => import('../screens/line/LineScreen').then((m) => m.LineScreen);
const loadLineSettings = () =>
  import('../screens/line-settings/LineSettingsScreen').then((m) => m.LineSettingsScreen);
const loadReport = () => import('../screens/report/ReportScreen').then((m) => m.ReportScreen);
const loadSection = () => import('../screens/section/SectionScreen').then((m) => m.SectionScreen);
const loadSpan = () => import('../screens/span/SpanScreen').then((m) => m.SpanScreen);
const loadReading = () => import('../screens/reading/ReadingScreen').then((m) => m.ReadingScreen);
const loadResult = () => import('../screens/result/ResultScreen').then((m) => m.ResultScreen);

function Screen({ route }: { route: Route }) {
  const { lineId = '', spanId = '', sectionId = '', readingId = '' } = route.params;
  switch (route.name) {
    case 'lines':
      return <LinesScreen />;
    case 'conductors':
      return <LazyScreen load={loadConductors} props={{}} />;
    case 'line':
      return <LazyScreen load={loadLine} props={{ lineId }} />;
    case 'line-settings':
      return <LazyScreen load={loadLineSettings} props={{ lineId }} />;
    case 'line-report':
      return <LazyScreen load={loadReport} props={{ lineId }} />;
    case 'section':
      return <LazyScreen load={loadSection} props={{ lineId, sectionId }} />;
    case 'span':
      return <LazyScreen load={loadSpan} props={{ lineId, spanId }} />;
    case 'new-reading':
      return (
        <LazyScreen load={loadReading} props={{ lineId, spanId, wireId: route.query.get('wire') ?? '' }} />
      );
    case 'result':
      return <LazyScreen load={loadResult} props={{ lineId, readingId }} />;
  }
}

function useOnline(): boolean {
  const [online, setOnline] = useState(() => navigator.onLine);
  useEffect(() => {
    const update = (): void => setOnline(navigator.onLine);
    window.addEventListener('online', update);
    window.addEventListener('offline', update);
    return () => {
      window.removeEventListener('online', update);
      window.removeEventListener('offline', update);
    };
  }, []);
  return online;
}

export function App({ data }: { data: AppData }) {
  const route = useRoute();
  const online = useOnline();
  const [accepted, setAccepted] = useState(cautionsAccepted);
  const [update, setUpdate] = useState<UpdateHandle | null>(null);

  useEffect(() => registerServiceWorker(setUpdate), []);

  return (
    <DataContext.Provider value={data}>
      <header class="app-top">
        <a class="app-top__brand" href={href()}>
          <img src="./icon.svg" alt="" width={36} height={36} />
          Spanlog
        </a>
        <span class="app-top__spacer" />
        {!online && <span class="app-offline">Offline: saving on this phone</span>}
        <a class="app-top__link" href={href('conductors')}>
          Conductors
        </a>
      </header>
      <main class="app-main" id="main">
        {accepted ? (
          <Screen
            key={`${route.name}:${Object.values(route.params).join('/')}:${route.query.toString()}`}
            route={route}
          />
        ) : (
          <WelcomeNotice onAccept={() => setAccepted(true)} />
        )}
      </main>
      {update && <UpdateBar update={update} onLater={() => setUpdate(null)} />}
    </DataContext.Provider>
  );
}
