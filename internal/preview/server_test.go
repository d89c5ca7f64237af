package preview_test

import (
	"bufio"
	"bytes"
	"encoding/json"
	"net/http"
	"net/http/httptest"
	"os"
	"strings"
	"testing"
	"time"

	"arcwright/internal/export"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/preview"
)

func TestEndpoints(t *testing.T) {
	path, _ := copyLayout(t)
	_, hs := serve(t, path)
	for _, tc := range []struct {
		path, ctype string
		starts      string
		contains    []string
	}{
		{"/", "text/html; charset=utf-8", "<!doctype html>", []string{`src="/app.js"`, "hearing protection", "predictions of the mean flow", "take precedence", "Keep out"}},
		{"/app.js", "text/javascript; charset=utf-8", "// arcwright", []string{"EventSource", "/plan.json", "/plan.svg"}},
		{"/style.css", "text/css; charset=utf-8", ":root", []string{".stale-banner"}},
		{"/plan.json", "application/json", "{", []string{`"format": "arcwright-plan"`, `"stations"`}},
		{"/plan.svg", "image/svg+xml", "<svg", []string{`class="station `, `class="zones" data-point="CU-136"`}},
		{"/sheet.pdf", "application/pdf", "%PDF-", nil},
		{"/status.json", "application/json", "{", []string{`"current": true`, `"units": "metric"`}},
	} {
		t.Run(tc.path, func(t *testing.T) {
			res, body := get(t, hs.URL+tc.path)
			if res.StatusCode != http.StatusOK {
				t.Fatalf("got status %d, want 200: %s", res.StatusCode, body)
			}
			if got := res.Header.Get("Content-Type"); got != tc.ctype {
				t.Errorf("got Content-Type %q, want %q", got, tc.ctype)
			}
			if !bytes.HasPrefix(body, []byte(tc.starts)) {
				t.Errorf("body starts %q, want %q", body[:min(len(body), 20)], tc.starts)
			}
			for _, c := range tc.contains {
				if !bytes.Contains(body, []byte(c)) {
					t.Errorf("body lacks %q", c)
				}
			}
			// nothing from elsewhere: the page works offline
			for _, bad := range []string{"http://", "https://", "//cdn"} {
				if tc.path != "/plan.svg" && bytes.Contains(body, []byte(bad)) && tc.path != "/sheet.pdf" && tc.path != "/plan.json" {
					t.Errorf("body refers to %q: the page must need no network", bad)
				}
			}
			// the plan's outputs say which version they are, so that the
			// page can tell a set fetched across a save
			if strings.Contains(tc.path, ".") && !strings.HasSuffix(tc.path, ".js") && !strings.HasSuffix(tc.path, ".css") {
				if v := res.Header.Get(preview.VersionHeader); v != "1" {
					t.Errorf("got %s %q, want 1", preview.VersionHeader, v)
				}
			}
			if csp := res.Header.Get("Content-Security-Policy"); !strings.Contains(csp, "default-src 'none'") {
				t.Errorf("got Content-Security-Policy %q, want one that loads nothing from elsewhere", csp)
			}
		})
	}
}

// The only http:// in the drawing is the SVG namespace name, which is not
// fetched.
func TestSVGNeedsNoNetwork(t *testing.T) {
	path, _ := copyLayout(t)
	_, hs := serve(t, path)
	_, body := get(t, hs.URL+"/plan.svg")
	rest := bytes.ReplaceAll(body, []byte(`xmlns="http://www.w3.org/2000/svg"`), nil)
	if bytes.Contains(rest, []byte("http")) {
		t.Error("the SVG refers to a URL other than its namespace")
	}
}

// /plan.json is the contract of 'plan --format json': the export package's
// bytes for the same file.
func TestPlanJSONIsTheExport(t *testing.T) {
	path, _ := copyLayout(t)
	_, hs := serve(t, path)
	_, body := get(t, hs.URL+"/plan.json")
	req, _, err := layout.Load(path)
	if err != nil {
		t.Fatal(err)
	}
	p, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	var want bytes.Buffer
	if err := export.JSON(&want, p); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(body, want.Bytes()) {
		t.Error("/plan.json differs from export.JSON of the same file")
	}
}

func TestReadOnlyAndNoPaths(t *testing.T) {
	path, _ := copyLayout(t)
	_, hs := serve(t, path)
	for _, tc := range []struct {
		method, path string
		want         int
	}{
		{http.MethodPost, "/plan.json", http.StatusMethodNotAllowed},
		{http.MethodPut, "/", http.StatusMethodNotAllowed},
		{http.MethodDelete, "/plan.svg", http.StatusMethodNotAllowed},
		{http.MethodGet, "/cell.yaml", http.StatusNotFound},
		{http.MethodGet, "/../../etc/passwd", http.StatusNotFound},
		{http.MethodGet, "/assets/index.html", http.StatusNotFound},
		{http.MethodGet, "/plan.json/x", http.StatusNotFound},
		{http.MethodHead, "/plan.json", http.StatusOK},
	} {
		t.Run(tc.method+" "+tc.path, func(t *testing.T) {
			r, err := http.NewRequest(tc.method, hs.URL+tc.path, nil)
			if err != nil {
				t.Fatal(err)
			}
			res, err := http.DefaultClient.Do(r)
			if err != nil {
				t.Fatal(err)
			}
			res.Body.Close()
			if res.StatusCode != tc.want {
				t.Errorf("got %d, want %d", res.StatusCode, tc.want)
			}
		})
	}
}

// problemsBody is the 422 answer.
type problemsBody struct {
	Errors []struct {
		File    *string `json:"file"`
		Line    *int    `json:"line"`
		Key     *string `json:"key"`
		Message *string `json:"message"`
	} `json:"errors"`
}

func TestBadLayout(t *testing.T) {
	path, text := copyLayout(t)
	s, hs := serve(t, path)
	_, goodSVG := get(t, hs.URL+"/plan.svg")
	bad, line := broken(t, text)
	writeFile(t, path, bad)
	s.Reload()

	res, body := get(t, hs.URL+"/plan.json")
	if res.StatusCode != http.StatusUnprocessableEntity {
		t.Fatalf("got %d, want 422", res.StatusCode)
	}
	var pb problemsBody
	if err := json.Unmarshal(body, &pb); err != nil {
		t.Fatalf("422 body is not JSON: %v\n%s", err, body)
	}
	if len(pb.Errors) != 1 {
		t.Fatalf("got %d errors, want 1: %s", len(pb.Errors), body)
	}
	e := pb.Errors[0]
	if e.File == nil || e.Line == nil || e.Key == nil || e.Message == nil {
		t.Fatalf("an error lacks file, line, key or message: %s", body)
	}
	if *e.File != path || *e.Line != line || *e.Key != "nozzle.diameter" || !strings.Contains(*e.Message, "kg") {
		t.Errorf("got %s:%d %s %q, want %s:%d nozzle.diameter and a message naming kg", *e.File, *e.Line, *e.Key, *e.Message, path, line)
	}
	// the last good drawing, marked stale; no sheet of a bad file
	res, svg := get(t, hs.URL+"/plan.svg")
	if res.StatusCode != http.StatusOK || res.Header.Get(preview.StaleHeader) != "1" || !bytes.Equal(svg, goodSVG) {
		t.Errorf("/plan.svg: got %d, stale %q, same drawing %v; want 200, stale 1, the last good drawing", res.StatusCode, res.Header.Get(preview.StaleHeader), bytes.Equal(svg, goodSVG))
	}
	if res, _ := get(t, hs.URL+"/sheet.pdf"); res.StatusCode != http.StatusUnprocessableEntity {
		t.Errorf("/sheet.pdf: got %d, want 422", res.StatusCode)
	}
	_, st := get(t, hs.URL+"/status.json")
	if !bytes.Contains(st, []byte(`"current": false`)) || !bytes.Contains(st, []byte(`"has_plan": true`)) || !bytes.Contains(st, []byte("nozzle.diameter")) {
		t.Errorf("status while bad: %s", st)
	}
	// fixing the file brings the plan back
	writeFile(t, path, text)
	s.Reload()
	if res, _ := get(t, hs.URL+"/plan.json"); res.StatusCode != http.StatusOK {
		t.Errorf("after the fix: got %d, want 200", res.StatusCode)
	}
	if res, _ := get(t, hs.URL+"/plan.svg"); res.Header.Get(preview.StaleHeader) != "" {
		t.Error("after the fix the drawing is still marked stale")
	}
}

// A file that never planned: no drawing to show, every output 422.
func TestNeverGood(t *testing.T) {
	path, text := copyLayout(t)
	bad, _ := broken(t, text)
	writeFile(t, path, bad)
	_, hs := serve(t, path)
	for _, p := range []string{"/plan.json", "/plan.svg", "/sheet.pdf"} {
		if res, body := get(t, hs.URL+p); res.StatusCode != http.StatusUnprocessableEntity || !bytes.Contains(body, []byte(`"errors"`)) {
			t.Errorf("%s: got %d %s, want 422 with the errors", p, res.StatusCode, body)
		}
	}
	// a missing file is a problem of the whole file, without a line
	os.Remove(path)
	s := preview.New(path)
	hs2 := httptestServer(t, s)
	_, body := get(t, hs2+"/plan.json")
	if !bytes.Contains(body, []byte(`"line": 0`)) || !bytes.Contains(body, []byte("cannot read")) {
		t.Errorf("missing file: got %s", body)
	}
}

// Events: one "plan" event per change of the plan, none for a save that
// changes nothing, and the stream ends when the server closes.
func TestEvents(t *testing.T) {
	path, text := copyLayout(t)
	s := preview.New(path)
	url := httptestServer(t, s)
	res, err := http.Get(url + "/events")
	if err != nil {
		t.Fatal(err)
	}
	defer res.Body.Close()
	if ct := res.Header.Get("Content-Type"); ct != "text/event-stream" {
		t.Fatalf("got Content-Type %q, want text/event-stream", ct)
	}
	events := make(chan string, 10)
	go func() {
		sc := bufio.NewScanner(res.Body)
		var ev []string
		for sc.Scan() {
			if sc.Text() == "" {
				if len(ev) > 0 && strings.HasPrefix(ev[0], "event: ") {
					events <- strings.Join(ev, "\n")
				}
				ev = nil
				continue
			}
			ev = append(ev, sc.Text())
		}
		close(events)
	}()
	next := func(what string) string {
		t.Helper()
		select {
		case e, ok := <-events:
			if !ok {
				t.Fatalf("%s: the stream ended", what)
			}
			return e
		case <-time.After(5 * time.Second):
			t.Fatalf("%s: no event in 5 s", what)
		}
		return ""
	}
	// wait until the stream is subscribed: its greeting came with the headers
	v0 := s.Version()
	if s.Reload() {
		t.Fatal("re-planning an unchanged file reported a change")
	}
	writeFile(t, path, fewerArcStations(t, text))
	if !s.Reload() {
		t.Fatal("an edit that changes the plan reported no change")
	}
	e := next("after an edit")
	if !strings.Contains(e, "event: plan") || !strings.Contains(e, `"current":true`) || !strings.Contains(e, `"version":`) {
		t.Errorf("got event %q", e)
	}
	bad, _ := broken(t, text)
	writeFile(t, path, bad)
	s.Reload()
	if e := next("after breaking the file"); !strings.Contains(e, `"current":false`) {
		t.Errorf("got event %q, want current false", e)
	}
	if got := s.Version(); got != v0+2 {
		t.Errorf("got version %d, want %d", got, v0+2)
	}
	s.Close()
	select {
	case _, ok := <-events:
		if ok {
			t.Error("an event after Close")
		}
	case <-time.After(5 * time.Second):
		t.Error("the stream did not end after Close")
	}
}

// httptestServer serves s without watching and returns its URL.
func httptestServer(t *testing.T, s *preview.Server) string {
	t.Helper()
	hs := httptestNew(s)
	t.Cleanup(func() { s.Close(); hs.Close() })
	return hs.URL
}

func TestLoopbackOnly(t *testing.T) {
	path, _ := copyLayout(t)
	s := preview.New(path)
	defer s.Close()
	h := preview.LoopbackOnly(s.Handler())
	for _, tc := range []struct {
		host string
		want int
	}{
		{"127.0.0.1:8570", http.StatusOK},
		{"localhost:8570", http.StatusOK},
		{"[::1]:8570", http.StatusOK},
		{"localhost", http.StatusOK},
		{"attacker.example:8570", http.StatusForbidden},
		{"192.168.1.20:8570", http.StatusForbidden},
	} {
		t.Run(tc.host, func(t *testing.T) {
			r := httptest.NewRequest(http.MethodGet, "/status.json", nil)
			r.Host = tc.host
			rec := httptest.NewRecorder()
			h.ServeHTTP(rec, r)
			if rec.Code != tc.want {
				t.Errorf("got %d, want %d", rec.Code, tc.want)
			}
		})
	}
}
