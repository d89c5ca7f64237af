package preview_test

import (
	"context"
	"encoding/json"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
)

// chromium returns the path of a Chromium to drive. In CI (CI=true) a
// missing browser fails the test; elsewhere it skips it.
func chromium(t *testing.T) string {
	t.Helper()
	for _, name := range []string{"chromium", "chromium-browser", "google-chrome", "chrome"} {
		if p, err := exec.LookPath(name); err == nil {
			return p
		}
	}
	if os.Getenv("CI") == "true" {
		t.Fatal("no Chromium on the path: CI must install it (.ci/run installs the Debian package chromium)")
	}
	t.Skip("no Chromium on the path (apt-get install chromium); CI runs this test")
	return ""
}

// browser starts a headless Chromium with a fresh profile and no network
// beyond what the page asks of loopback, and returns its context.
func browser(t *testing.T) context.Context {
	t.Helper()
	opts := []chromedp.ExecAllocatorOption{
		chromedp.ExecPath(chromium(t)),
		chromedp.Headless,
		chromedp.NoSandbox,
		chromedp.DisableGPU,
		chromedp.NoFirstRun,
		chromedp.NoDefaultBrowserCheck,
		chromedp.Flag("disable-quic", true),
		chromedp.Flag("disable-background-networking", true),
		chromedp.Flag("disable-component-update", true),
		chromedp.Flag("disable-sync", true),
		chromedp.Flag("disable-dev-shm-usage", true),
		chromedp.Flag("hide-scrollbars", true),
		chromedp.UserDataDir(t.TempDir()),
		chromedp.WindowSize(1400, 1100),
	}
	actx, cancelA := chromedp.NewExecAllocator(context.Background(), opts...)
	ctx, cancelB := chromedp.NewContext(actx)
	ctx, cancelT := context.WithTimeout(ctx, 90*time.Second)
	t.Cleanup(func() { cancelT(); cancelB(); cancelA() })
	if err := chromedp.Do(ctx); err != nil {
		t.Fatalf("starting Chromium: %v", err)
	}
	return ctx
}

// artifacts returns the folder for the test's screenshots:
// $ARCWRIGHT_ARTIFACTS when set, else a temporary folder.
func artifacts(t *testing.T) string {
	t.Helper()
	if d := os.Getenv("ARCWRIGHT_ARTIFACTS"); d != "" {
		if err := os.MkdirAll(d, 0o755); err != nil {
			t.Fatal(err)
		}
		return d
	}
	return t.TempDir()
}

// waitFor evaluates the JavaScript expression js until it yields true,
// for at most d.
func waitFor(t *testing.T, ctx context.Context, what, js string, d time.Duration) {
	t.Helper()
	deadline := time.Now().Add(d)
	for {
		ok, err := chromedp.Run(ctx, chromedp.Evaluate[bool](js))
		if err != nil {
			t.Fatalf("%s: %v", what, err)
		}
		if ok {
			return
		}
		if time.Now().After(deadline) {
			t.Fatalf("%s: not within %v", what, d)
		}
		time.Sleep(50 * time.Millisecond)
	}
}

// TestBrowser drives a real headless Chromium: it loads the page, counts
// the station symbols in the drawing, edits the layout file and sees the
// count change without a reload; then it breaks the file and sees the
// problems above the stale drawing, and fixes it again.
func TestBrowser(t *testing.T) {
	ctx := browser(t)
	path, text := copyLayout(t)
	_, hs := serve(t, path)

	const count = `document.querySelectorAll("#svg-holder svg g.station").length`
	if err := chromedp.Do(ctx, chromedp.Navigate(hs.URL+"/")); err != nil {
		t.Fatalf("loading the page: %v", err)
	}
	waitFor(t, ctx, "the drawing", count+" > 0", 10*time.Second)
	n0 := evalInt(t, ctx, count)
	// a mark that a reload of the page would wipe out
	if err := chromedp.Do(ctx, chromedp.Evaluate[chromedp.Void](`window.__sameLoad = 42`)); err != nil {
		t.Fatal(err)
	}
	// every station of the plan has a symbol
	want0 := stationCount(t, hs.URL)
	if n0 != want0 || n0 == 0 {
		t.Fatalf("got %d station symbols, want the plan's %d", n0, want0)
	}
	waitFor(t, ctx, "the station table", fmt.Sprintf(`document.querySelectorAll("#stations tbody tr").length === %d`, n0), 5*time.Second)
	// pointing at a station shows its checks and reasons
	if err := chromedp.Do(ctx, chromedp.Evaluate[chromedp.Void](`document.querySelector('#svg-holder g.station[data-id="A-01"]').dispatchEvent(new MouseEvent("mouseenter"))`)); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, "the station's checks", `(() => { const d = document.getElementById("detail"); return d.textContent.includes("A-01") && d.querySelectorAll("table.checks tr").length >= 10 && d.textContent.includes("velocity clearance") })()`, 5*time.Second)

	// zoom in and back
	const width = `document.querySelector("#svg-holder svg").viewBox.baseVal.width`
	w0 := evalFloat(t, ctx, width)
	if err := chromedp.Do(ctx, chromedp.Evaluate[chromedp.Void](`document.getElementById("zoom-in").click()`)); err != nil {
		t.Fatal(err)
	}
	if w := evalFloat(t, ctx, width); !(w < 0.8*w0) {
		t.Errorf("zoom in: viewBox width %g, want below %g", w, 0.8*w0)
	}
	if err := chromedp.Do(ctx, chromedp.Evaluate[chromedp.Void](`document.getElementById("zoom-fit").click()`)); err != nil {
		t.Fatal(err)
	}
	if w := evalFloat(t, ctx, width); w != w0 {
		t.Errorf("fit: viewBox width %g, want %g", w, w0)
	}

	writeFile(t, path, fewerArcStations(t, text))
	waitFor(t, ctx, "the drawing after the edit", count+fmt.Sprintf(` !== %d`, n0), 5*time.Second)
	n1 := evalInt(t, ctx, count)
	if want1 := stationCount(t, hs.URL); n1 != want1 || n1 >= n0 {
		t.Fatalf("after the edit: got %d station symbols, want the new plan's %d, fewer than %d", n1, want1, n0)
	}
	same, err := chromedp.Run(ctx, chromedp.Evaluate[bool](`window.__sameLoad === 42`))
	if err != nil {
		t.Fatal(err)
	}
	if !same {
		t.Error("the page was reloaded; want it redrawn in place")
	}
	shot(t, ctx, "serve-edited.png")

	// a bad file: problems with their lines, the last good drawing marked stale
	bad, line := broken(t, text)
	writeFile(t, path, bad)
	waitFor(t, ctx, "the problems", fmt.Sprintf(`!document.getElementById("problems").hidden && document.getElementById("problem-list").textContent.includes("cell.yaml:%d") && document.getElementById("problem-list").textContent.includes("nozzle.diameter")`, line), 5*time.Second)
	waitFor(t, ctx, "the stale mark", `document.getElementById("drawing").dataset.stale === "true" && getComputedStyle(document.getElementById("stale-banner")).display !== "none"`, 5*time.Second)
	if n := evalInt(t, ctx, count); n != n1 {
		t.Errorf("while stale: got %d station symbols, want the last good %d", n, n1)
	}
	shot(t, ctx, "serve-stale.png")

	writeFile(t, path, text)
	waitFor(t, ctx, "the plan back", fmt.Sprintf(`document.getElementById("problems").hidden && document.getElementById("drawing").dataset.stale === "false" && %s === %d`, count, n0), 5*time.Second)
	shot(t, ctx, "serve.png")
}

// shot saves a screenshot of the whole page as a test artifact.
func shot(t *testing.T, ctx context.Context, name string) {
	t.Helper()
	png, err := chromedp.Run(ctx, chromedp.FullScreenshot(100))
	if err != nil {
		t.Fatalf("screenshot: %v", err)
	}
	p := filepath.Join(artifacts(t), name)
	if err := os.WriteFile(p, png, 0o644); err != nil {
		t.Fatal(err)
	}
	t.Logf("screenshot %s", p)
}

// evalInt evaluates the JavaScript expression js to a whole number.
func evalInt(t *testing.T, ctx context.Context, js string) int {
	t.Helper()
	n, err := chromedp.Run(ctx, chromedp.Evaluate[int](js))
	if err != nil {
		t.Fatalf("%s: %v", js, err)
	}
	return n
}

// stationCount returns the number of stations in the served /plan.json.
func stationCount(t *testing.T, url string) int {
	t.Helper()
	res, body := get(t, url+"/plan.json")
	if res.StatusCode != 200 {
		t.Fatalf("/plan.json: got %d", res.StatusCode)
	}
	var doc struct {
		Stations []json.RawMessage `json:"stations"`
	}
	if err := json.Unmarshal(body, &doc); err != nil {
		t.Fatal(err)
	}
	return len(doc.Stations)
}

// evalFloat evaluates the JavaScript expression js to a number.
func evalFloat(t *testing.T, ctx context.Context, js string) float64 {
	t.Helper()
	v, err := chromedp.Run(ctx, chromedp.Evaluate[float64](js))
	if err != nil {
		t.Fatalf("%s: %v", js, err)
	}
	return v
}
