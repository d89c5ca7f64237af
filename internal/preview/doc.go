// Package preview serves a live preview of one layout file: a page that
// draws the plan view and lists the station verdicts, and redraws within a
// second of each save of the file, in any editor.
//
// A [Server] plans the file with the planner, keeps the plan's JSON (the
// export package's, the contract of 'arcwright plan --format json'), the
// plan view as SVG (the sheet package's model, as the PDF draws it) and
// renders the PDF sheet on request. [Server.Watch] watches the file's
// directory (so editors that save by writing a new file and renaming it
// over the old one are seen) and re-plans on each change; every change of
// the plan is announced to the page as a Server-Sent Event.
//
// # Endpoints
//
//	GET /            the page (every asset embedded; nothing is fetched from elsewhere)
//	GET /plan.json   the plan; 422 with {"errors": [{"file", "line", "key", "message"}]} while the layout is bad
//	GET /plan.svg    the plan view; while the layout is bad, the last good drawing with the header X-Arcwright-Stale: 1
//	GET /sheet.pdf   the floor layout sheet; 422 while the layout is bad
//	GET /status.json the plan's version, whether it is current, the units and the errors
//	GET /events      Server-Sent Events: an event "plan" each time the plan changes
//
// The server is read-only: it answers GET and HEAD only, and no part of a
// request reaches the file system. [LoopbackOnly] keeps a server on
// loopback from answering requests addressed to other host names. When the
// file's folder cannot be watched, Watch compares the file's size and time
// four times a second instead.
package preview
