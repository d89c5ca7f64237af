package preview_test

import (
	"context"
	"io"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"arcwright/internal/preview"
)

// demo is the demo layout the tests serve (a copy of it).
const demo = "../../layouts/anechoic-model-jet.yaml"

// copyLayout copies the demo into a fresh folder and returns the copy's
// path and its text.
func copyLayout(t testing.TB) (string, string) {
	t.Helper()
	data, err := os.ReadFile(demo)
	if err != nil {
		t.Fatalf("reading the demo: %v", err)
	}
	path := filepath.Join(t.TempDir(), "cell.yaml")
	if err := os.WriteFile(path, data, 0o644); err != nil {
		t.Fatal(err)
	}
	return path, string(data)
}

// fewerArcStations is an edit of the demo that halves the arc's stations:
// 30° to 150° in 20° steps instead of 10°.
func fewerArcStations(t testing.TB, text string) string {
	t.Helper()
	const from, to = "polar: {from: 30 deg, to: 150 deg, step: 10 deg}", "polar: {from: 30 deg, to: 150 deg, step: 20 deg}"
	if !strings.Contains(text, from) {
		t.Fatalf("the demo no longer has %q; update the test's edit", from)
	}
	return strings.Replace(text, from, to, 1)
}

// brokenLine is an edit of the demo that gives the nozzle a diameter in a
// unit of mass, and the line it is on.
func broken(t testing.TB, text string) (string, int) {
	t.Helper()
	const from, to = "diameter: 50.8 mm", "diameter: 50.8 kg"
	i := strings.Index(text, from)
	if i < 0 {
		t.Fatalf("the demo no longer has %q; update the test's edit", from)
	}
	return strings.Replace(text, from, to, 1), strings.Count(text[:i], "\n") + 1
}

// serve starts a preview of path, watching the file, behind an httptest
// server; both stop at the end of the test.
func serve(t testing.TB, path string) (*preview.Server, *httptest.Server) {
	t.Helper()
	s := preview.New(path)
	ctx, cancel := context.WithCancel(context.Background())
	done := make(chan error, 1)
	go func() { done <- s.Watch(ctx) }()
	hs := httptest.NewServer(s.Handler())
	t.Cleanup(func() {
		s.Close()
		hs.Close()
		cancel()
		<-done
	})
	return s, hs
}

// get fetches url and returns the response and its body.
func get(t testing.TB, url string) (*http.Response, []byte) {
	t.Helper()
	res, err := http.Get(url)
	if err != nil {
		t.Fatalf("GET %s: %v", url, err)
	}
	defer res.Body.Close()
	body, err := io.ReadAll(res.Body)
	if err != nil {
		t.Fatalf("GET %s: reading the body: %v", url, err)
	}
	return res, body
}

// writeFile replaces the file's content in place.
func writeFile(t testing.TB, path, text string) {
	t.Helper()
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
}

// httptestNew serves s behind an httptest server.
func httptestNew(s *preview.Server) *httptest.Server { return httptest.NewServer(s.Handler()) }
