import createDOMPurify, { type Config } from 'dompurify';
import { JSDOM } from 'jsdom';

const SVG_NS = 'http://www.w3.org/2000/svg';

/** url(…) that does not point inside the document (#id): a request to somewhere else. */
const EXTERNAL_URL = /url\(\s*(?!['"]?\s*#)[^)]*\)/gi;
const hasExternalUrl = (value: string) => value.search(EXTERNAL_URL) !== -1;
/** Embedded bitmaps are common in exported artwork and load nothing from outside. */
const EMBEDDED_IMAGE = /^data:image\/(png|jpeg|gif|webp);/i;

// One window for the process: DOMPurify keeps hooks on its instance, and a jsdom window is costly.
const { window } = new JSDOM('');
const purify = createDOMPurify(window as unknown as Parameters<typeof createDOMPurify>[0]);

purify.addHook('uponSanitizeElement', (node) => {
  if (node.nodeName.toLowerCase() === 'style' && node.textContent) {
    node.textContent = node.textContent.replace(/@import[^;]*;?/gi, '').replace(EXTERNAL_URL, 'none');
  }
});
purify.addHook('afterSanitizeAttributes', (node) => {
  for (const attr of [...node.attributes]) {
    const value = attr.value.trim();
    const isLink = attr.localName === 'href';
    const isInternal = value.startsWith('#') || (node.localName === 'image' && EMBEDDED_IMAGE.test(value));
    if ((isLink && !isInternal) || hasExternalUrl(value)) node.removeAttributeNode(attr);
  }
});

const CONFIG: Config = {
  USE_PROFILES: { svg: true, svgFilters: true },
  // <use> is how design tools repeat a shape; its href is limited to #ids by the hook above.
  ADD_TAGS: ['use'],
  // Foreign objects embed HTML; animation elements can rewrite attributes (href) after the fact.
  FORBID_TAGS: ['foreignObject', 'animate', 'animateMotion', 'animateTransform', 'set', 'discard'],
};

/** True when the text parses as XML with an <svg> root in the SVG namespace. */
export function isSvgDocument(text: string): boolean {
  // Entity declarations are how XML bombs start; artwork never needs them.
  if (/<!ENTITY/i.test(text)) return false;
  const doc = new window.DOMParser().parseFromString(text, 'image/svg+xml');
  const root = doc.documentElement;
  return doc.getElementsByTagName('parsererror').length === 0 && root?.localName === 'svg' && root.namespaceURI === SVG_NS;
}

/**
 * The SVG with scripts, event handlers, foreign objects, animation and every reference outside the
 * document removed, serialised as XML (not HTML, so entities like &nbsp; cannot break it).
 *
 * @example sanitiseSvg('<svg xmlns="http://www.w3.org/2000/svg" onload="x()"><script>x()</script><path d="M0 0"/></svg>')
 * // → '<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"><path d="M0 0"/></svg>'
 */
export function sanitiseSvg(text: string): string {
  const fragment = purify.sanitize(text, { ...CONFIG, RETURN_DOM_FRAGMENT: true });
  const root = fragment.firstElementChild;
  if (!root || root.localName !== 'svg') throw new Error('Nothing of the SVG was left after sanitising.');
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new window.XMLSerializer().serializeToString(root)}\n`;
}
