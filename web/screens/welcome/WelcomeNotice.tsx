// First-run notice: what the numbers are and are not, and the safety rules that come before any reading.
// Accepted once per device.
import { Button } from '../../components/button/Button';
import { Caution } from '../../components/caution/Caution';
import { acceptCautions } from '../../app/prefs';
import './welcome.css';

export function WelcomeNotice({ onAccept }: { onAccept: () => void }) {
  return (
    <section class="welcome" aria-labelledby="welcome-title">
      <h1 id="welcome-title">Before you measure</h1>
      <p>
        Spanlog turns field sag readings into the horizontal tension of each span on the exact catenary. It
        keeps everything on this phone and works with no signal.
      </p>
      <Caution title="Read this once">
        <ul>
          <li>
            Results are <strong>estimates for inspection</strong>. They do not replace engineering review, the
            owner's standards, the local code or licensed practice.
          </li>
          <li>
            Only touch, strike or jerk a conductor that is <strong>de-energized, tested and grounded</strong>{' '}
            under your employer's rules, or work with approved live-line tools as a qualified worker.
          </li>
          <li>Keep the required approach distances from energized parts at all times.</li>
          <li>Conductors under tension can recoil: stay clear of rigging under load.</li>
          <li>Wind moves the wire: do not take sag readings in wind.</li>
        </ul>
      </Caution>
      <Button
        look="primary"
        wide
        onClick={() => {
          acceptCautions(new Date().toISOString());
          onAccept();
        }}
      >
        I understand: start
      </Button>
    </section>
  );
}
