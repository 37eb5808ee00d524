/** Version of the sync wire format (the messages in this folder). Bump on any incompatible change. */
export const PROTOCOL_VERSION = 1;
/** Oldest protocol version the server still answers. */
export const MIN_PROTOCOL_VERSION = 1;
/** Version of the record schemas in shared/schemas that the messages carry. */
export const SCHEMA_VERSION = 2;
/**
 * Oldest record schema version the server still accepts. Version 2 added antennaSpots.legAzimuthDeg and
 * stations.crewMemberIds; a version-1 app would refuse those records on pull (its schemas are strict), so it is
 * told to reload (its unsynced changes stay in its outbox and go up from the reloaded app).
 */
export const MIN_SCHEMA_VERSION = 2;

export type VersionVerdict = { type: 'ok' } | { type: 'client-too-old'; message: string } | { type: 'server-too-old'; message: string };

/** The server's answer to the versions a request carries. */
export function checkVersions(protocolVersion: number, schemaVersion: number): VersionVerdict {
  if (protocolVersion < MIN_PROTOCOL_VERSION || schemaVersion < MIN_SCHEMA_VERSION) {
    return { type: 'client-too-old', message: 'This copy of Loftline is too old to sync. Reload or update the app; your unsynced changes are kept.' };
  }
  if (protocolVersion > PROTOCOL_VERSION || schemaVersion > SCHEMA_VERSION) {
    return { type: 'server-too-old', message: 'The club server runs an older Loftline than this app. Your changes are kept on this device until it is updated.' };
  }
  return { type: 'ok' };
}
