package preview_test

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// smallLayout is the layout the watch tests serve: one probe in a small
// chamber and one cold operating point, so that planning it takes little
// of the second the test allows for a save to show.
const smallLayout = `arcwright: 1
title:
  title: TITLE
polar_angle: from_jet_axis
cell:
  kind: anechoic
  boundary: [[0 m, 0 m], [4 m, 0 m], [4 m, 3 m], [0 m, 3 m], [0 m, 0 m]]
  ceiling: 3 m
nozzle:
  exit: [1 m, 1.5 m]
  axis_height: 1.5 m
  heading: 0 deg
  kind: convergent
  diameter: 10 mm
operating_points:
  - name: cold
    npr: 1.2
    temperature_ratio: 1.0
band:
  low: 1 kHz
  high: 40 kHz
arrays:
  - name: T
    probes:
      - name: probe
        at: [2 m, 2.5 m, 1.5 m]
`

// TestWatch edits the served file the three ways editors save and expects
// /plan.json to change within a second of each: writing in place, writing
// a new file and renaming it over the old one, and truncating the file
// before writing it. Each save gives the layout a new title.
func TestWatch(t *testing.T) {
	retitled := func(s string) string { return strings.Replace(smallLayout, "TITLE", s, 1) }
	path := filepath.Join(t.TempDir(), "cell.yaml")
	writeFile(t, path, retitled("First"))
	s, hs := serve(t, path)
	if ps := s.Problems(); ps != nil {
		t.Fatalf("the test layout does not plan: %v", ps)
	}
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
