// Belt and braces on top of the empty sandbox: no scripts, no remote fetches, only inline styles and embedded images.
const CONTENT_POLICY =
  '<meta http-equiv="Content-Security-Policy" content="default-src \'none\'; style-src \'unsafe-inline\'; img-src data:">';

/**
 * Renders an e-mail's HTML part where it cannot touch the app: an iframe with `sandbox=""`
 * runs no scripts, submits no forms and gets an opaque origin, so cookies and storage are out of reach.
 */
export function HtmlPartFrame({ html, title }: { html: string; title: string }) {
  return (
    <iframe
      sandbox=""
      srcDoc={`${CONTENT_POLICY}${html}`}
      title={title}
      referrerPolicy="no-referrer"
      className="h-96 w-full rounded-md border border-rule bg-white"
      data-testid="mailbox-html"
    />
  );
}
