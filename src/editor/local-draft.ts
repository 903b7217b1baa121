import type { JSONContent } from '@tiptap/core';

/** What the browser keeps until the server confirms a save. */
export interface LocalDraft {
  /** The server version the edits started from. */
  baseVersion: number;
  title: string;
  doc: JSONContent;
  keptAt: string;
}

const key = (pageId: string) => `starproof:page-draft:${pageId}`;

/** The unsaved draft kept for a page in this browser, if any. */
export function readLocalDraft(pageId: string): LocalDraft | null {
  try {
    const raw = localStorage.getItem(key(pageId));
    return raw ? (JSON.parse(raw) as LocalDraft) : null;
  } catch {
    return null;
  }
}

/**
 * Keeps the writer's text in this browser. A full storage quota is not fatal: the server copy and
 * the open editor still hold the text; the caller says so.
 * @returns false when the browser refused to store it
 */
export function keepLocalDraft(pageId: string, draft: Omit<LocalDraft, 'keptAt'>): boolean {
  try {
    localStorage.setItem(key(pageId), JSON.stringify({ ...draft, keptAt: new Date().toISOString() }));
    return true;
  } catch {
    return false;
  }
}

/** Forgets the local draft once the server has the same text. */
export function dropLocalDraft(pageId: string): void {
  try {
    localStorage.removeItem(key(pageId));
  } catch {
    // Storage unavailable: nothing was kept.
  }
}
