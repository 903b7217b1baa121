/** The read-only public API for a venue's website: published pages only, no sign-in. */

import type { PublicEvidence } from '../statements/public-evidence.ts';

export interface PublicStatementDto {
  id: string;
  /** The wording as signed off for publication. */
  text: string;
  /** Small print that qualifies it (which band, which cosmology, which night), or null. */
  note: string | null;
  /** When the figure was last accepted (or computed), ISO 8601. */
  asOf: string;
  /**
   * "How we know": the working behind this wording retold for visitors (measurements with their
   * sources, the model and the formula in words, every other source, when it was last checked).
   * Null while the figures behind the signed wording are being checked again.
   */
  howWeKnow: PublicEvidence | null;
}

export interface PublicImageDto {
  id: string;
  /** Absolute (PUBLIC_URL, or the CDN's address), so another site can show it as it is. */
  url: string | null;
  altText: string;
  credit: string;
  licence: string;
  licenceUrl: string | null;
  sourceUrl: string;
}

/** Another language version of the same page (hreflang-style), the page itself included. */
export interface PublicAlternateDto {
  /** BCP 47 tag, as hreflang takes it. */
  hreflang: string;
  title: string;
  slug: string;
  /** Absolute address of that version in this API. */
  href: string;
  /** The version a reader gets when none of their languages is there (hreflang "x-default"). */
  isDefault: boolean;
}

export interface PublicPageDto {
  id: string;
  /** Stable while the title stays the same; either the slug or the id finds the page. */
  slug: string;
  /** The page's public address, absolute: `${PUBLIC_URL}/explore/<slug>`. */
  url: string;
  title: string;
  locale: string;
  object: { id: string; name: string; kind: string };
  /** The first paragraph as plain text. */
  summary: string;
  publishedAt: string | null;
  /** Sanitized HTML of the published version, statements in their signed-off wording; image addresses absolute. */
  html: string;
  /** The organisation's eye-safety notice when the page is about looking at the Sun (shared/editor/caution.ts), else null. */
  eyeSafetyNotice: string | null;
  statements: PublicStatementDto[];
  images: PublicImageDto[];
  /** Every published language version of this page, itself included (one entry when it has no other). */
  alternates: PublicAlternateDto[];
}
