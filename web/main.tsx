// Entry point: open storage, then show the app. If storage cannot open, say so plainly.
import { render } from 'preact';
import { App } from './app/App';
import { openAppData } from './app/open-data';

const root = document.getElementById('app');

if (root !== null) {
  openAppData()
    .then((data) => render(<App data={data} />, root))
    .catch((error: unknown) => {
      root.textContent = `Spanlog could not open its storage on this device (${String(error)}). Check that the browser allows site data, then reload.`;
    });
}
