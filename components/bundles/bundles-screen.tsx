// The admin's rollout bundles: pick a site, see what goes in and what is left out and why, untick PCs to
// bundle only some, download with progress, and fetch a past bundle again from the history.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useBundleDownload, useBundleHistoryQuery, useBundlePreviewQuery } from '@/hooks/use-bundles';
import { useSitesQuery } from '@/hooks/use-sites';
import { Banner } from '@/components/ui/banner';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { Small } from '@/components/ui/text';
import { IncludedList, LeftOutList } from './bundle-contents';
import { BundleHistory } from './bundle-history';
import { DownloadPanel } from './download-panel';
import { saveZip } from './save-zip';

export function BundlesScreen() {
  const { wide } = useBreakpoints();
  const router = useRouter();
  const params = useLocalSearchParams<{ site?: string }>();
  const sites = useSitesQuery({ limit: 500 });
  const list = sites.data?.items ?? [];
  const chosen = Number(params.site) || (list.length === 1 ? list[0].id : null);
  const preview = useBundlePreviewQuery(chosen);
  const history = useBundleHistoryQuery(chosen);
  const download = useBundleDownload(chosen, saveZip);
  const [unticked, setUnticked] = useState<Set<number>>(new Set());
  useEffect(() => setUnticked(new Set()), [chosen]);

  const included = preview.data?.included ?? [];
  const ticked = useMemo(() => new Set(included.map((p) => p.stationId).filter((id) => !unticked.has(id))), [included, unticked]);
  const running = download.state.step === 'running';

  const pickSite = (id: string) => {
    download.reset();
    router.setParams({ site: id });
  };
  const tick = (stationId: number, on: boolean) =>
    setUnticked((prev) => {
      const next = new Set(prev);
      if (on) next.delete(stationId);
      else next.add(stationId);
      return next;
    });
  const start = () => {
    if (!chosen) return;
    const all = ticked.size === included.length;
    void download.start({ siteId: chosen, ...(all ? {} : { stationIds: [...ticked] }) });
  };

  const data = preview.data;
  const panel = data ? <DownloadPanel preview={data} count={ticked.size} state={download.state} onStart={start} onCancel={download.cancel} /> : null;
  const pastBundles = data ? <BundleHistory items={history.data?.items ?? []} busy={running} onAgain={(r) => void download.again(r)} /> : null;
  const inList = data ? <IncludedList items={included} ticked={ticked} onTick={tick} disabled={running} /> : null;
  const outList = data ? <LeftOutList items={data.leftOut} /> : null;

  return (
    <Screen title="Rollout bundles" subtitle="One zip per site: for each PC with an approved plan, the new and original startup files, the diff, an installer, an undo and an install sheet." testID="bundles-screen">
      {sites.isError ? <Banner tone="error">{(sites.error as Error).message}</Banner> : null}
      {list.length > 0 ? (
        <Choice label="Site" testID="bundle-site" value={chosen ? String(chosen) : null} onChange={pickSite} options={list.map((s) => ({ value: String(s.id), label: s.name }))} />
      ) : sites.data ? (
        <Banner tone="note">No sites yet. A technician records the site and its stations first.</Banner>
      ) : null}
      {!chosen && list.length > 1 ? <Small>Choose a site to see what its bundle will hold.</Small> : null}
      {preview.isError ? <Banner tone="error">{(preview.error as Error).message}</Banner> : null}
      {chosen ? (
        <Banner tone="caution" title="Before running INSTALL on a PC">
          Keep a bootable floppy for that PC&apos;s DOS version at hand. INSTALL checks the PC&apos;s files first and changes nothing on a mismatch; if the PC will not start afterwards, boot from the floppy and run RESTORE from the backup folder (SHEET.TXT says how).
        </Banner>
      ) : null}
      {wide ? (
        // Side by side from 900 px: the lists on the left, the download and the history beside them.
        <View style={styles.wide}>
          <View style={[styles.column, styles.main]}>
            {inList}
            {outList}
          </View>
          <View style={[styles.column, styles.side]}>
            {panel}
            {pastBundles}
          </View>
        </View>
      ) : (
        // Phone: the download first, then what goes in and what stays out, the history last.
        <View style={styles.column}>
          {panel}
          {inList}
          {outList}
          {pastBundles}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  wide: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  main: { flex: 3, minWidth: 0 },
  side: { flex: 2, minWidth: 0 },
  column: { gap: space.xl },
});
