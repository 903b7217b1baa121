import type { JSONContent } from '@tiptap/core';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import type { PageDto, PageServerVersion } from '@shared/schemas/page.ts';
import { PageLimits } from '@shared/validations.ts';
import { pageConflictOf, pageKeys, savePage } from '@/api/pages.ts';
import { ApiRequestError } from '@/lib/api-client.ts';
import { dropLocalDraft, keepLocalDraft } from './local-draft.ts';

export type SaveState = 'saved' | 'unsaved' | 'saving' | 'offline' | 'conflict' | 'refused';

/** Both versions after a 409: the writer's and the one on the server (sent with the 409). */
export interface Conflict {
  mine: { title: string; doc: JSONContent };
  theirs: PageServerVersion;
}

interface Options {
  pageId: string;
  version: number;
  read: () => { title: string; doc: JSONContent };
  onSaved: (page: PageDto) => void;
}

/**
 * Saves a few seconds after the last change, with the version it started from. The text is kept in
 * this browser first and dropped only when the server confirms; a stale version (409) stops saving
 * and hands back both versions; a lost connection retries with growing pauses.
 */
export function useAutosave({ pageId, version, read, onSaved }: Options) {
  const queryClient = useQueryClient();
  const [state, setState] = useState<SaveState>('saved');
  const [message, setMessage] = useState<string | null>(null);
  const [savedAt, setSavedAt] = useState<Date | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const versionRef = useRef(version);
  const editsRef = useRef(0);
  const savedEditsRef = useRef(0);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const inFlight = useRef(false);
  const retryDelay = useRef(2000);
  const blocked = useRef(false);
  const retrying = useRef(false);

  const save = useCallback(async () => {
    if (inFlight.current || blocked.current) return;
    inFlight.current = true;
    const editsAtStart = editsRef.current;
    const content = read();
    setState('saving');
    try {
      const page = await savePage(pageId, { version: versionRef.current, ...content });
      versionRef.current = page.version;
      savedEditsRef.current = editsAtStart;
      retryDelay.current = 2000;
      retrying.current = false;
      setSavedAt(new Date());
      setMessage(null);
      onSaved(page);
      if (editsRef.current === editsAtStart) {
        dropLocalDraft(pageId);
        setState('saved');
      } else {
        keepLocalDraft(pageId, { baseVersion: page.version, ...read() });
        setState('unsaved');
        timer.current = setTimeout(() => void save(), PageLimits.autosaveMs);
      }
    } catch (error) {
      const e =
        error instanceof ApiRequestError ? error : new ApiRequestError(0, 'network_error', 'Starproof cannot be reached.');
      retrying.current = false;
      const theirs = pageConflictOf(e);
      if (theirs) {
        blocked.current = true;
        setConflict({ mine: content, theirs });
        setState('conflict');
        setMessage(e.message);
      } else if (e.status === 0 || e.status >= 500) {
        const why =
          e.status === 503
            ? 'The database is not answering.'
            : e.code === 'timeout'
              ? 'Starproof did not answer in time.'
              : e.status === 0
                ? 'Starproof cannot be reached.'
                : 'The server ran into a problem.';
        retrying.current = true;
        setState('offline');
        setMessage(
          `${why} Your text is kept in this browser; Starproof tries again by itself in ${retryDelay.current / 1000} seconds.`,
        );
        timer.current = setTimeout(() => void save(), retryDelay.current);
        retryDelay.current = Math.min(retryDelay.current * 2, 30_000);
      } else {
        setState('refused');
        setMessage(`${e.message} Your text is kept in this browser.`);
      }
    } finally {
      inFlight.current = false;
    }
  }, [pageId, read, onSaved]);

  /** Call on every change: keeps the text locally at once and saves a little later. */
  const changed = useCallback(() => {
    editsRef.current += 1;
    const kept = keepLocalDraft(pageId, { baseVersion: versionRef.current, ...read() });
    if (!kept) setMessage('This browser would not keep a local copy (storage is full). Saving to the server still works.');
    // After a failed save the planned retry carries this edit too, and the words keep saying so.
    if (blocked.current || retrying.current) return;
    setState((s) => (s === 'saving' ? s : 'unsaved'));
    clearTimeout(timer.current);
    timer.current = setTimeout(() => void save(), PageLimits.autosaveMs);
  }, [pageId, read, save]);

  /** After a 409: keep my text (saved over the server's) or take theirs. */
  const resolve = useCallback(
    (choice: 'mine' | 'theirs', apply: (title: string, doc: JSONContent) => void) => {
      if (!conflict) return;
      versionRef.current = conflict.theirs.version;
      blocked.current = false;
      setConflict(null);
      if (choice === 'theirs') {
        apply(conflict.theirs.title, conflict.theirs.doc as JSONContent);
        dropLocalDraft(pageId);
        // The 409 carried the text; the rest of the page (flags, statements, revision) comes with the next read.
        void queryClient.invalidateQueries({ queryKey: pageKeys.detail(pageId) });
        setState('saved');
        setMessage(null);
      } else {
        apply(conflict.mine.title, conflict.mine.doc);
        void save();
      }
    },
    [conflict, pageId, queryClient, save],
  );

  /** Saves now (before submitting). */
  const flush = useCallback(async () => {
    clearTimeout(timer.current);
    while (inFlight.current) await new Promise((r) => setTimeout(r, 100));
    if (editsRef.current !== savedEditsRef.current) await save();
    return versionRef.current;
  }, [save]);

  useEffect(() => {
    const warn = (e: BeforeUnloadEvent) => {
      if (state !== 'saved') e.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [state]);

  useEffect(() => () => clearTimeout(timer.current), []);

  return { state, message, savedAt, conflict, changed, resolve, flush, version: () => versionRef.current };
}
