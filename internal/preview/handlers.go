package preview

import (
	"embed"
	"encoding/json"
	"fmt"
	"net"
	"net/http"
	"strconv"
	"time"

	"arcwright/internal/units"
)

//go:embed assets/index.html assets/app.js assets/style.css
var assets embed.FS

// StaleHeader is the response header set to "1" on /plan.svg when the
// drawing is the last good one and the file as it is now does not plan.
const StaleHeader = "X-Arcwright-Stale"

// VersionHeader carries the version of what a response shows.
const VersionHeader = "X-Arcwright-Version"

// keepAlive is how often an idle event stream sends a comment, so that a
// closed page is noticed.
const keepAlive = 15 * time.Second

// Handler returns the HTTP handler of the endpoints listed in the package
// documentation. Other paths answer 404 and other methods 405.
func (s *Server) Handler() http.Handler {
	mux := http.NewServeMux()
	mux.HandleFunc("GET /{$}", asset("assets/index.html", "text/html; charset=utf-8"))
	mux.HandleFunc("GET /app.js", asset("assets/app.js", "text/javascript; charset=utf-8"))
	mux.HandleFunc("GET /style.css", asset("assets/style.css", "text/css; charset=utf-8"))
	mux.HandleFunc("GET /plan.json", s.planJSON)
	mux.HandleFunc("GET /plan.svg", s.planSVG)
	mux.HandleFunc("GET /sheet.pdf", s.sheetPDFHandler)
	mux.HandleFunc("GET /status.json", s.status)
	mux.HandleFunc("GET /events", s.events)
	return secure(mux)
}

// secure sets the headers every answer carries: nothing is cached, nothing
// is loaded from elsewhere, the page is not framed.
func secure(h http.Handler) http.Handler {
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		hd := w.Header()
		hd.Set("Cache-Control", "no-store")
		hd.Set("X-Content-Type-Options", "nosniff")
		hd.Set("Referrer-Policy", "no-referrer")
		hd.Set("Content-Security-Policy", "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' data:; connect-src 'self'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'")
		h.ServeHTTP(w, r)
	})
}

// asset serves one embedded file.
func asset(name, ctype string) http.HandlerFunc {
	data, err := assets.ReadFile(name)
	if err != nil {
		panic("preview: asset missing from the binary: " + name) // the embed directive lists it
	}
	return func(w http.ResponseWriter, r *http.Request) {
		w.Header().Set("Content-Type", ctype)
		w.Header().Set("Content-Length", strconv.Itoa(len(data)))
		if r.Method == http.MethodHead {
			return
		}
		w.Write(data)
	}
}

// write sends data with its type and the snapshot's version.
func write(w http.ResponseWriter, r *http.Request, sn *snapshot, code int, ctype string, data []byte) {
	w.Header().Set("Content-Type", ctype)
	w.Header().Set("Content-Length", strconv.Itoa(len(data)))
	w.Header().Set(VersionHeader, strconv.Itoa(sn.version))
	w.WriteHeader(code)
	if r.Method != http.MethodHead {
		w.Write(data)
	}
}

// problemsDoc is the body of a 422 answer.
type problemsDoc struct {
	Errors []Problem `json:"errors"`
}

// unprocessable answers 422 with the snapshot's problems.
func unprocessable(w http.ResponseWriter, r *http.Request, sn *snapshot) {
	ps := sn.problems
	if ps == nil {
		ps = []Problem{}
	}
	data, _ := json.MarshalIndent(problemsDoc{Errors: ps}, "", "  ") // strings and ints only: cannot fail
	write(w, r, sn, http.StatusUnprocessableEntity, "application/json", append(data, '\n'))
}

func (s *Server) planJSON(w http.ResponseWriter, r *http.Request) {
	sn := s.snapshot()
	if !sn.current() {
		unprocessable(w, r, sn)
		return
	}
	write(w, r, sn, http.StatusOK, "application/json", sn.json)
}

func (s *Server) planSVG(w http.ResponseWriter, r *http.Request) {
	sn := s.snapshot()
	if !sn.good {
		unprocessable(w, r, sn)
		return
	}
	if !sn.current() {
		w.Header().Set(StaleHeader, "1")
	}
	write(w, r, sn, http.StatusOK, "image/svg+xml", sn.svg)
}

func (s *Server) sheetPDFHandler(w http.ResponseWriter, r *http.Request) {
	sn := s.snapshot()
	if !sn.current() {
		unprocessable(w, r, sn)
		return
	}
	data, err := s.sheetPDF(sn)
	if err != nil {
		sn := *sn
		sn.problems = []Problem{{File: s.path, Message: err.Error()}}
		unprocessable(w, r, &sn)
		return
	}
	w.Header().Set("Content-Disposition", `inline; filename="sheet.pdf"`)
	write(w, r, sn, http.StatusOK, "application/pdf", data)
}

// statusDoc is the body of /status.json.
type statusDoc struct {
	Version int       `json:"version"`
	File    string    `json:"file"`
	Current bool      `json:"current"` // the plan served is of the file as it is now
	HasPlan bool      `json:"has_plan"`
	Units   string    `json:"units"` // "metric" or "imperial": how the layout prints lengths
	Errors  []Problem `json:"errors"`
}

func (s *Server) status(w http.ResponseWriter, r *http.Request) {
	sn := s.snapshot()
	d := statusDoc{Version: sn.version, File: s.path, Current: sn.current(), HasPlan: sn.good, Units: "metric", Errors: sn.problems}
	if sn.units == units.Imperial {
		d.Units = "imperial"
	}
	if d.Errors == nil {
		d.Errors = []Problem{}
	}
	data, _ := json.MarshalIndent(d, "", "  ") // strings, ints and bools only: cannot fail
	write(w, r, sn, http.StatusOK, "application/json", append(data, '\n'))
}

// events streams an event "plan" each time what is served changes, with
// the new version and whether the plan is current.
func (s *Server) events(w http.ResponseWriter, r *http.Request) {
	fl, ok := w.(http.Flusher)
	if !ok {
		http.Error(w, "streaming is not supported by this connection", http.StatusInternalServerError)
		return
	}
	ch := s.subscribe()
	defer s.unsubscribe(ch)
	h := w.Header()
	h.Set("Content-Type", "text/event-stream")
	h.Set("X-Accel-Buffering", "no")
	w.WriteHeader(http.StatusOK)
	if r.Method == http.MethodHead {
		return
	}
	fmt.Fprintf(w, "retry: 1000\n: arcwright plan version %d\n\n", s.Version())
	fl.Flush()
	tick := time.NewTicker(keepAlive)
	defer tick.Stop()
	for {
		select {
		case <-r.Context().Done():
			return
		case <-s.closed:
			return
		case <-ch:
			sn := s.snapshot()
			if _, err := fmt.Fprintf(w, "event: plan\nid: %d\ndata: {\"version\":%d,\"current\":%t}\n\n", sn.version, sn.version, sn.current()); err != nil {
				return
			}
			fl.Flush()
		case <-tick.C:
			if _, err := fmt.Fprint(w, ": keep-alive\n\n"); err != nil {
				return
			}
			fl.Flush()
		}
	}
}

// LoopbackOnly wraps h so that it answers only requests addressed to this
// computer: a Host of "localhost" or a loopback address, with any port.
// Others get 403, so that a web page elsewhere that points its own name at
// 127.0.0.1 cannot read the plan through the visitor's browser. Use it when
// the server listens on loopback.
func LoopbackOnly(h http.Handler) http.Handler {
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		host := r.Host
		if hh, _, err := net.SplitHostPort(host); err == nil {
			host = hh
		}
		ok := host == "localhost"
		if ip := net.ParseIP(host); ip != nil {
			ok = ip.IsLoopback()
		}
		if !ok {
			http.Error(w, "this preview answers requests for localhost only", http.StatusForbidden)
			return
		}
		h.ServeHTTP(w, r)
	})
}
