import { createContext, useContext } from 'react';
import type { StatementLocale } from '@shared/statements/locales.ts';

/** What node views need from the page around them. */
export interface PageEditorContextValue {
  locale: StatementLocale;
  eyeSafetyNotice: string;
  /** Opens a statement's working beside the page. */
  openStatement: (statementId: string) => void;
}

export const PageEditorContext = createContext<PageEditorContextValue>({
  locale: 'en-GB',
  eyeSafetyNotice: '',
  openStatement: () => undefined,
});

/** The page's locale, notice text and the "show working" action, for node views. */
export const usePageEditorContext = () => useContext(PageEditorContext);
