import type { RecordMeta } from './meta';

/**
 * Whether an incoming copy of a record (from import or sync) should replace the stored one.
 *
 * Rule: the higher revision wins. On equal revisions the stored copy stays when it is the same change (same
 * updatedAt and deviceId), which makes applying the same file or message twice a no-op. Two different changes
 * with equal revisions (concurrent edits on two devices) are ordered by updatedAt, then by deviceId, so every
 * replica picks the same winner whatever the order of arrival.
 */
export function incomingWins(stored: RecordMeta | undefined, incoming: RecordMeta): boolean {
  if (stored === undefined) return true;
  if (incoming.revision !== stored.revision) return incoming.revision > stored.revision;
  const incomingTime = Date.parse(incoming.updatedAt);
  const storedTime = Date.parse(stored.updatedAt);
  if (incomingTime !== storedTime) return incomingTime > storedTime;
  return incoming.deviceId > stored.deviceId;
}
