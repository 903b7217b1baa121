/**
 * Classic cross-site scripting payloads (common practice: the families in the OWASP XSS filter
 * evasion notes, written out from memory). Every one that runs sets `window.__pwned` or opens a
 * dialog, so a browser test notices it. Each is short enough for a 120-character name field.
 */
export const XSS_PAYLOADS: readonly string[] = [
  // Script elements
  '<script>window.__pwned=1</script>',
  '<SCRIPT>window.__pwned=1</SCRIPT>',
  '<script src=data:text/javascript,window.__pwned=1></script>',
  '</title><script>window.__pwned=1</script>',
  '</textarea><script>window.__pwned=1</script>',
  // Event attributes
  '<img src=x onerror="window.__pwned=1">',
  '<img src=x onerror=alert(1)>',
  '<body onload=window.__pwned=1>',
  '<input autofocus onfocus=window.__pwned=1>',
  '<details open ontoggle=window.__pwned=1>',
  '<video><source onerror="window.__pwned=1"></video>',
  '<div onmouseover="window.__pwned=1" style="position:fixed;inset:0">x</div>',
  // javascript: URLs, several spellings
  '<a href="javascript:window.__pwned=1">click</a>',
  '<a href="JaVaScRiPt:alert(1)">click</a>',
  '<a href="jav&#x09;ascript:alert(1)">click</a>',
  '<a href="&#106;avascript:alert(1)">click</a>',
  'javascript:window.__pwned=1',
  '<iframe src="javascript:parent.__pwned=1"></iframe>',
  // SVG and MathML
  '<svg onload=window.__pwned=1>',
  '<svg><script>window.__pwned=1</script></svg>',
  '<svg><a xlink:href="javascript:alert(1)"><text y=20>x</text></a></svg>',
  '<math><mtext><table><mglyph><style><img src=x onerror=window.__pwned=1>',
  '<math href="javascript:alert(1)">x</math>',
  // Attribute breakouts
  '"><img src=x onerror=window.__pwned=1>',
  "'><svg onload=window.__pwned=1>",
  '" autofocus onfocus="window.__pwned=1',
  "' onmouseover='window.__pwned=1",
  // Template and framework tricks
  // biome-ignore lint/suspicious/noTemplateCurlyInString: the payload is a template placeholder, sent as plain text on purpose
  '${window.__pwned=1}',
  '{{constructor.constructor("window.__pwned=1")()}}',
  '`;window.__pwned=1;`',
  '<template><img src=x onerror=window.__pwned=1></template>',
  // CSS expressions and style tricks
  '<div style="width:expression(window.__pwned=1)">x</div>',
  '<style>@import "javascript:alert(1)";</style>',
  '<div style="background:url(javascript:alert(1))">x</div>',
  // Other containers
  '<object data="javascript:alert(1)"></object>',
  '<embed src="javascript:alert(1)">',
  '<meta http-equiv="refresh" content="0;url=javascript:alert(1)">',
  '<base href="javascript:alert(1)//">',
];

/** Spreadsheet formula starters (common practice: the CSV injection advice of spreadsheet vendors). */
export const FORMULA_PAYLOADS: readonly string[] = [
  '=HYPERLINK("https://evil.example","Click")',
  "+1+cmd|' /C calc'!A0",
  '-2+3',
  "@SUM(1+1)*cmd|' /C calc'!A0",
  '\t=1+1',
  '\r=1+1',
  '\u22121+2',
];
