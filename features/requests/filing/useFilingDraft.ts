// The filing form's draft, on the device and on Spanrelay. What is typed is kept on the device a
// moment after each change; "Save draft" sends it to the server, or, with the connection down,
// queues it and sends it when the browser says the connection is back (or the screen next opens).
// A request already on Spanrelay (a draft carried on, a returned request being revised) is kept
// under its own id, so reopening it on this device finds what was typed there.
import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { RequestDraft } from '../../../shared/requests/requestBody';
import type { RequestDetail } from '../../../shared/requests/types';
import { useActor } from '../../auth/useActor';
import { ApiError } from '../../api/http';
import { listDrafts, newLocalId, patchDraft, readDraft, removeDraft, sendQueued, type DeviceDraft, type ServerDraftRef } from '../../drafts/deviceDrafts';
import { deviceStore } from '../../drafts/deviceStore';
import { browserOnline, useOnline } from '../../drafts/useOnline';
import { useCreateDraft, useUpdateDraft } from '../api';
import { fetchFreshDetail } from './freshDraft';
import { draftBodyFrom } from './draftBody';
import { isEditableState, requestCopyId, seedForRequest } from './editRequest';
import { emptyFiling, type FilingFormValues } from './formValues';
import { isFilingStep, type FilingStep } from './steps';
import { filingValuesFrom } from './valuesFromDraft';

const KEEP_AFTER_MS = 400;

export const keptOnDevice = 'Saved on this device; it will be sent when the connection returns.';
export const sentToServer = 'Draft saved to Spanrelay';

export type DraftNotice = { tone: 'ok' | 'info' | 'caution' | 'error'; text: string };
// What the form starts from: blank, a draft kept on the device, or the server's copy after a clash.
export type FormSeed = { key: number; values: FilingFormValues | null; step: FilingStep; pickAgain: string[] };
export type KeptDraft = DeviceDraft<FilingFormValues>;

export const isOffline = (err: unknown) => err instanceof ApiError && err.status === 0 && err.code !== 'cancelled';

const refOf = (d: RequestDetail): ServerDraftRef => ({ id: d.id, version: d.version, number: d.number });
const now = () => new Date().toISOString();

function withBlanks(values: FilingFormValues): FilingFormValues {
  const blank = emptyFiling(values.type, values.projectId);
  return { ...blank, ...values };
}

// The request opened for editing, and its current revision as the form's boxes.
export type OpenedRequest = { detail: RequestDetail; values: FilingFormValues };

export function useFilingDraft(opened?: OpenedRequest) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { data: actor } = useActor();
  const userId = actor?.id ?? null;
  const createDraft = useCreateDraft();
  const updateDraft = useUpdateDraft();
  const store = useMemo(deviceStore, []);

  const [localId, setLocalId] = useState(() => (opened ? requestCopyId(opened.detail.id) : newLocalId()));
  const [server, setServer] = useState<ServerDraftRef | null>(() => (opened ? refOf(opened.detail) : null));
  const [adopted, setAdopted] = useState(!opened);
  // What the form held when it opened: a copy no different from it is not worth keeping.
  const baseline = useRef<FilingFormValues | null>(opened?.values ?? null);
  const noun = opened?.detail.state === 'revising' ? 'request' : 'draft';
  const savedWords = opened?.detail.state === 'revising' ? `Revision ${opened.detail.currentRevision} saved to Spanrelay` : sentToServer;
  const [notice, setNotice] = useState<DraftNotice | null>(null);
  const [saving, setSaving] = useState(false);
  const [seed, setSeed] = useState<FormSeed>({ key: 0, values: null, step: 'kind', pickAgain: [] });
  const [kept, setKept] = useState<KeptDraft[]>([]);
  const pendingKeep = useRef<ReturnType<typeof setTimeout> | null>(null);
  const round = useRef<Promise<void> | null>(null);
  const latest = useRef<{ values: FilingFormValues; step: FilingStep } | null>(null);
  const current = useRef({ localId, server });
  current.current = { localId, server };

  const refreshKept = useCallback(() => {
    if (userId) setKept(listDrafts<FilingFormValues>(store, userId));
  }, [store, userId]);

  const send = useCallback(
    async (body: RequestDraft, to: ServerDraftRef | null): Promise<ServerDraftRef> =>
      refOf(to ? await updateDraft.mutateAsync({ id: to.id, version: to.version, body }) : await createDraft.mutateAsync(body)),
    // The mutation objects change every render; their mutateAsync does not need to be fresh.
    [],
  );

  const writeNow = useCallback(
    (change: Partial<KeptDraft>) => {
      if (!userId) return;
      const { localId: id, server: ref } = current.current;
      const snapshot = latest.current;
      patchDraft<FilingFormValues>(store, userId, id, (d) => {
        const values = snapshot?.values ?? d?.values;
        if (!values) return null;
        return {
          localId: id,
          userId,
          server: ref ?? d?.server ?? null,
          values,
          step: snapshot?.step ?? d?.step ?? 'kind',
          fileNames: d?.fileNames ?? [],
          queued: d?.queued ?? false,
          refused: d?.refused ?? null,
          ...change,
          updatedAt: now(),
        };
      });
    },
    [store, userId],
  );

  /** Called with the form's values as they change; kept on the device a moment after typing stops. */
  const keep = useCallback(
    (values: FilingFormValues, step: FilingStep) => {
      latest.current = { values, step };
      if (pendingKeep.current) clearTimeout(pendingKeep.current);
      pendingKeep.current = setTimeout(() => {
        pendingKeep.current = null;
        const exists = userId ? readDraft(store, userId, current.current.localId) !== null : false;
        // An untouched form (at most a kind chosen) is not a draft worth offering later.
        if (!exists && JSON.stringify(values) === JSON.stringify(baseline.current ?? emptyFiling(values.type, values.projectId))) return;
        writeNow({});
      }, KEEP_AFTER_MS);
    },
    [store, userId, writeNow],
  );

  const keepFiles = useCallback((names: string[]) => writeNow({ fileNames: names }), [writeNow]);

  const flushKeep = () => {
    if (pendingKeep.current) {
      clearTimeout(pendingKeep.current);
      pendingKeep.current = null;
    }
    writeNow({});
  };

  // A draft kept on the device may have been filed or changed elsewhere since: look before carrying on.
  const reloadFrom = useCallback(
    (fresh: RequestDetail, text: string) => {
      const body = fresh.revisions.find((r) => r.revision === fresh.currentRevision)?.body ?? fresh.revisions[fresh.revisions.length - 1]?.body;
      setServer(refOf(fresh));
      current.current = { ...current.current, server: refOf(fresh) };
      if (body) {
        const values = filingValuesFrom(body);
        latest.current = { values, step: latest.current?.step ?? 'where' };
        setSeed((s) => ({ key: s.key + 1, values, step: latest.current!.step, pickAgain: [] }));
      }
      writeNow({ server: refOf(fresh), queued: false, refused: null });
      setNotice({ tone: 'caution', text });
    },
    [writeNow],
  );

  const onServerRefusal = useCallback(
    async (err: ApiError): Promise<boolean> => {
      const ref = current.current.server;
      if (!ref || err.status !== 409) return false;
      const fresh = await fetchFreshDetail(queryClient, ref.id).catch(() => null);
      if (!fresh) return false;
      if (!isEditableState(fresh.state)) {
        if (userId) removeDraft(store, userId, current.current.localId);
        router.replace(`/requests/${fresh.id}`);
        return true;
      }
      reloadFrom(fresh, `Someone changed this ${noun} on Spanrelay since you opened it. It has been reloaded with their version; check it and save again.`);
      return true;
    },
    [queryClient, reloadFrom, router, store, userId, noun],
  );

  const queueHere = useCallback(() => {
    writeNow({ queued: true, refused: null });
    setNotice({ tone: 'info', text: keptOnDevice });
    refreshKept();
  }, [refreshKept, writeNow]);

  /** "Save draft": to Spanrelay when it can be reached, else kept and queued on the device. */
  const save = useCallback(
    async (values: FilingFormValues, step: FilingStep) => {
      latest.current = { values, step };
      flushKeep();
      const body = draftBodyFrom(values);
      if (!body) {
        setNotice({ tone: 'error', text: 'Choose the project first: a draft is saved under its project.' });
        return;
      }
      if (!browserOnline()) return queueHere();
      setSaving(true);
      try {
        // A queued copy on its way now would otherwise be created a second time by this save.
        if (round.current) await round.current;
        const ref = await send(body, current.current.server);
        setServer(ref);
        current.current = { ...current.current, server: ref };
        writeNow({ server: ref, queued: false, refused: null });
        setNotice({ tone: 'ok', text: `${savedWords} as ${ref.number}.` });
      } catch (err) {
        if (isOffline(err)) queueHere();
        else if (!(err instanceof ApiError && (await onServerRefusal(err)))) setNotice({ tone: 'error', text: err instanceof Error ? err.message : String(err) });
      } finally {
        setSaving(false);
        refreshKept();
      }
    },
    [send, writeNow, queueHere, onServerRefusal, refreshKept, savedWords],
  );

  /** Sends what waits on the device; the open draft's notice changes once it is through. */
  const sendWaiting = useCallback(async () => {
    if (!userId || !browserOnline()) return;
    // One round at a time: the screen opening and the connection returning can come together,
    // and two rounds would each create the same draft.
    if (round.current) return round.current;
    round.current = sendRound().finally(() => {
      round.current = null;
    });
    return round.current;
  }, [userId]);

  const sendRound = async () => {
    if (!userId) return;
    const outcomes = await sendQueued<FilingFormValues>(
      store,
      userId,
      async (d) => {
        const body = draftBodyFrom(withBlanks(d.values));
        if (!body) throw new Error('No project was chosen, so it cannot be saved on Spanrelay; open it and choose one.');
        return send(body, d.server);
      },
      isOffline,
    );
    for (const o of outcomes) {
      if (o.localId !== current.current.localId) continue;
      if ('server' in o) {
        setServer(o.server);
        current.current = { ...current.current, server: o.server };
        setNotice({ tone: 'ok', text: `${savedWords} as ${o.server.number}.` });
      } else if ('refused' in o) setNotice({ tone: 'error', text: `The draft kept on this device was not saved to Spanrelay: ${o.refused}` });
    }
    refreshKept();
  };

  const online = useOnline(useCallback(() => void sendWaiting(), [sendWaiting]));

  // When the screen opens (and once the person is known), whatever waited is sent.
  useEffect(() => {
    refreshKept();
    void sendWaiting();
  }, [refreshKept, sendWaiting]);

  useEffect(() => () => void (pendingKeep.current && clearTimeout(pendingKeep.current)), []);

  // A request opened for editing starts from this device's copy of it when that is still current.
  useEffect(() => {
    if (!opened || adopted || !userId) return;
    const kept = readDraft<FilingFormValues>(store, userId, requestCopyId(opened.detail.id));
    const start = seedForRequest(opened.detail, opened.values, kept);
    const values = withBlanks(start.values);
    const step = isFilingStep(start.step) ? start.step : 'kind';
    latest.current = { values, step };
    if (start.setAside) removeDraft(store, userId, requestCopyId(opened.detail.id));
    setSeed((s) => ({ key: s.key + 1, values, step, pickAgain: start.pickAgain }));
    if (start.queued) setNotice({ tone: 'info', text: keptOnDevice });
    else if (start.unsaved) setNotice({ tone: 'info', text: 'Carrying on with what you typed on this device; it is not saved to Spanrelay yet.' });
    else if (start.setAside) setNotice({ tone: 'caution', text: `This ${noun} changed on Spanrelay after this device last kept your typing; the form shows the version on Spanrelay.` });
    setAdopted(true);
  }, [opened, adopted, userId, store, noun]);

  /** Carries on with a draft kept on this device, in place of the blank form. */
  const carryOn = useCallback(
    async (d: KeptDraft) => {
      const values = withBlanks(d.values);
      const step = isFilingStep(d.step) ? d.step : 'kind';
      latest.current = { values, step };
      current.current = { localId: d.localId, server: d.server };
      setLocalId(d.localId);
      setServer(d.server);
      setSeed((s) => ({ key: s.key + 1, values, step, pickAgain: d.fileNames }));
      setNotice(d.queued ? { tone: 'info', text: keptOnDevice } : null);
      if (d.server && browserOnline()) {
        const fresh = await fetchFreshDetail(queryClient, d.server.id).catch(() => null);
        if (fresh && !isEditableState(fresh.state)) {
          if (userId) removeDraft(store, userId, d.localId);
          router.replace(`/requests/${fresh.id}`);
          return;
        }
        if (fresh && fresh.version !== d.server.version && !d.queued) {
          reloadFrom(fresh, 'This draft was changed on Spanrelay after this device last saved it; the form shows the version on Spanrelay.');
        }
      }
    },
    [queryClient, reloadFrom, router, store, userId],
  );

  const discard = useCallback(
    (d: KeptDraft) => {
      if (userId) removeDraft(store, userId, d.localId);
      refreshKept();
    },
    [refreshKept, store, userId],
  );

  /** Filed: the device copy has done its job. */
  const forget = useCallback(() => {
    if (pendingKeep.current) clearTimeout(pendingKeep.current);
    if (userId) removeDraft(store, userId, current.current.localId);
  }, [store, userId]);

  return {
    ready: userId !== null && adopted,
    online,
    localId,
    server,
    setServer: (ref: ServerDraftRef) => {
      current.current = { ...current.current, server: ref };
      setServer(ref);
      writeNow({ server: ref });
    },
    notice,
    saving,
    seed,
    // Other drafts on this device the person may carry on with.
    kept: kept.filter((d) => d.localId !== localId),
    keep,
    keepFiles,
    save,
    queueHere,
    onServerRefusal,
    carryOn,
    discard,
    forget,
  };
}
