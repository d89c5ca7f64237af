package preview_test

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// TestWatch edits the served file the three ways editors save and expects
// /plan.json to change within a second of each: writing in place, writing
// a new file and renaming it over the old one, and truncating the file
// before writing it. It serves the smallest demo and edits its title, so
// that the second measures the watching, not the planning.
func TestWatch(t *testing.T) {
	data, err := os.ReadFile("../../layouts/hard-wall-exhaust-room.yaml")
	if err != nil {
		t.Fatal(err)
	}
	text := string(data)
	const title = "title: Exhaust pipe noise, short arc"
	if !strings.Contains(text, title) {
		t.Fatalf("the demo no longer has %q; update the test's edit", title)
	}
	retitled := func(s string) string { return strings.Replace(text, title, "title: "+s, 1) }
	path := filepath.Join(t.TempDir(), "cell.yaml")
	writeFile(t, path, text)
	s, hs := serve(t, path)
	_, before := get(t, hs.URL+"/plan.json")
	steps := []struct {
		name, title string
		save        func(t *testing.T, text string)
	}{
		{"write in place", "Saved in place", func(t *testing.T, s string) { writeFile(t, path, s) }},
		{"rename over", "Saved by rename", func(t *testing.T, s string) {
			tmp := filepath.Join(filepath.Dir(path), ".cell.yaml.swp")
			writeFile(t, tmp, s)
			if err := os.Rename(tmp, path); err != nil {
				t.Fatal(err)
			}
		}},
		{"truncate then write", "Saved after truncating", func(t *testing.T, s string) {
			f, err := os.OpenFile(path, os.O_WRONLY|os.O_TRUNC, 0)
			if err != nil {
				t.Fatal(err)
			}
			// an editor's truncate and its write are two events
			if err := f.Sync(); err != nil {
				t.Fatal(err)
			}
			if _, err := f.WriteString(s); err != nil {
				t.Fatal(err)
			}
			if err := f.Close(); err != nil {
				t.Fatal(err)
			}
		}},
	}
	for _, st := range steps {
		t.Run(st.name, func(t *testing.T) {
			v := s.Version()
			st.save(t, retitled(st.title))
			saved := time.Now()
			deadline := saved.Add(time.Second)
			for {
				// the version is cheap to ask for; the plan is fetched
				// once it moved
				if s.Version() != v {
					res, body := get(t, hs.URL+"/plan.json")
					if res.StatusCode == 200 && !bytes.Equal(body, before) && bytes.Contains(body, []byte(st.title)) {
						before = body
						t.Logf("changed %v after the save", time.Since(saved).Round(time.Millisecond))
						return
					}
					v = s.Version()
				}
				if time.Now().After(deadline) {
					res, _ := get(t, hs.URL+"/plan.json")
					t.Fatalf("/plan.json did not change to the new title within 1 s of the save (status %d)", res.StatusCode)
				}
				time.Sleep(10 * time.Millisecond)
			}
		})
	}
}

// A folder that cannot be watched (here: it does not exist yet) is polled
// instead: the file appears and plans within a second.
func TestWatchWithoutEvents(t *testing.T) {
	data, err := os.ReadFile(demo)
	if err != nil {
		t.Fatal(err)
	}
	dir := filepath.Join(t.TempDir(), "later")
	path := filepath.Join(dir, "cell.yaml")
	_, hs := serve(t, path)
	if res, _ := get(t, hs.URL+"/plan.json"); res.StatusCode != 422 {
		t.Fatalf("before the file exists: got %d, want 422", res.StatusCode)
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	writeFile(t, path, string(data))
	deadline := time.Now().Add(time.Second)
	for {
		res, _ := get(t, hs.URL+"/plan.json")
		if res.StatusCode == 200 {
			return
		}
		if time.Now().After(deadline) {
			t.Fatalf("/plan.json still %d 1 s after the file appeared", res.StatusCode)
		}
		time.Sleep(20 * time.Millisecond)
	}
}
