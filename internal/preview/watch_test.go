package preview_test

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"
	"time"
)

// TestWatch edits the served file the three ways editors save and expects
// /plan.json to change within a second of each: writing in place, writing
// a new file and renaming it over the old one, and truncating the file
// before writing it.
func TestWatch(t *testing.T) {
	path, text := copyLayout(t)
	_, hs := serve(t, path)
	_, before := get(t, hs.URL+"/plan.json")
	fewer := fewerArcStations(t, text)
	steps := []struct {
		name string
		text string
		save func(t *testing.T, text string)
	}{
		{"write in place", fewer, func(t *testing.T, s string) { writeFile(t, path, s) }},
		{"rename over", text, func(t *testing.T, s string) {
			tmp := filepath.Join(filepath.Dir(path), ".cell.yaml.swp")
			writeFile(t, tmp, s)
			if err := os.Rename(tmp, path); err != nil {
				t.Fatal(err)
			}
		}},
		{"truncate then write", fewer, func(t *testing.T, s string) {
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
			st.save(t, st.text)
			saved := time.Now()
			deadline := saved.Add(time.Second)
			for {
				res, body := get(t, hs.URL+"/plan.json")
				if res.StatusCode == 200 && !bytes.Equal(body, before) {
					before = body
					t.Logf("changed %v after the save", time.Since(saved).Round(time.Millisecond))
					return
				}
				if time.Now().After(deadline) {
					t.Fatalf("/plan.json did not change within 1 s of the save (last status %d)", res.StatusCode)
				}
				time.Sleep(20 * time.Millisecond)
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
