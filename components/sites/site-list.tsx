import { useRouter } from 'expo-router';
import { View } from 'react-native';
import { DataTable, ListRow, Tabular, Txt, type Column } from '@/components/ui';
import type { ClubEvent, Site } from '@/shared/schemas';
import { formatLatLon } from './lat-lon';

type Props = { sites: Site[]; events: ClubEvent[]; mode: 'rows' | 'table'; selectedId?: string };

/** The club's sites by name: rows on a phone and in a side pane, a table on a wide screen. */
export function SiteList({ sites, events, mode, selectedId }: Props) {
  const router = useRouter();
  const live = sites.filter((s) => !s.deletedAt).sort((a, b) => a.name.localeCompare(b.name));
  const eventCount = (id: string) => events.filter((e) => e.siteId === id && !e.deletedAt).length;
  const open = (s: Site) => router.navigate(`/sites/${s.id}`);
  if (mode === 'table') {
    const columns: Column<Site>[] = [
      { key: 'name', title: 'Site', flex: 2, render: (s) => <Txt variant="bodyStrong">{s.name}</Txt> },
      { key: 'ref', title: 'Reference point', flex: 2.2, render: (s) => <Tabular>{formatLatLon(s.refLat, s.refLon)}</Tabular> },
      { key: 'events', title: 'Events', flex: 0.8, numeric: true, render: (s) => String(eventCount(s.id)) },
      { key: 'updated', title: 'Changed', flex: 1.1, numeric: true, render: (s) => s.updatedAt.slice(0, 10) },
    ];
    return <DataTable testID="sites-table" columns={columns} rows={live} rowKey={(s) => s.id} rowLabel={(s) => `Open ${s.name}`} onRowPress={open} selectedKey={selectedId} />;
  }
  return (
    <View testID="sites-rows" style={{ borderRadius: 12, overflow: 'hidden' }}>
      {live.map((s) => {
        const n = eventCount(s.id);
        return (
          <ListRow
            key={s.id}
            testID={`site-row-${s.id}`}
            title={s.name}
            subtitle={`${formatLatLon(s.refLat, s.refLon)} · ${n} event${n === 1 ? '' : 's'}`}
            icon="map-pin"
            selected={s.id === selectedId}
            onPress={() => open(s)}
          />
        );
      })}
    </View>
  );
}
