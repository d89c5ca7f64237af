package layout

import (
	"errors"
	"os"
	"path/filepath"
	"reflect"
	"testing"
)

// FuzzDecode checks that any bytes give either a valid Request or a
// non-empty, sorted Errors value, never a panic, and the same answer twice.
// It is seeded with the demo layouts, the starter and the broken layouts.
func FuzzDecode(f *testing.F) {
	var seeds []string
	for _, pattern := range []string{
		filepath.Join(repoRoot, "layouts", "*.yaml"),
		filepath.Join(repoRoot, brokenDir, "*.yaml"),
		filepath.Join(repoRoot, unplannableDir, "*.yaml"),
	} {
		files, err := filepath.Glob(pattern)
		if err != nil {
			f.Fatal(err)
		}
		seeds = append(seeds, files...)
	}
	if len(seeds) < 13 {
		f.Fatalf("got %d seed files, want the 3 demos and at least 10 broken layouts", len(seeds))
	}
	for _, path := range seeds {
		data, err := os.ReadFile(path)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(data)
	}
	f.Add(Starter())
	f.Add([]byte(baseLayout))
	f.Add([]byte("a: &x [*x]\n"))
	f.Add([]byte("- 1\n- 2\n"))
	f.Add([]byte("arcwright: 1\n---\n"))
	f.Add([]byte("\ufeff" + baseLayout))
	f.Add([]byte("arcwright: !custom 1\ntitle: {title: \"a\\x07\"}\n"))
	f.Add([]byte("title:\n  date: 2026-02-30\n"))

	f.Fuzz(func(t *testing.T, data []byte) {
		const name = "fuzz.yaml"
		req, warns, err := Decode(name, data)
		if (req == nil) == (err == nil) {
			t.Fatalf("got request %v and error %v, want exactly one", req != nil, err)
		}
		if err != nil {
			var es Errors
			if !errors.As(err, &es) || len(es) == 0 {
				t.Fatalf("got error %T %v, want a non-empty Errors", err, err)
			}
			if warns != nil {
				t.Errorf("got warnings with the errors, want none")
			}
			for i, e := range es {
				if e.File != name || e.Line < 0 || e.Msg == "" {
					t.Errorf("error %d: got %#v, want file %q, line >= 0 and a message", i, e, name)
				}
				if i > 0 && (es[i-1].Line > e.Line || es[i-1].Line == e.Line && es[i-1].Field > e.Field) {
					t.Errorf("errors %d and %d out of order", i-1, i)
				}
			}
		} else {
			if req.Source != name {
				t.Errorf("Source: got %q, want %q", req.Source, name)
			}
			if err := req.Cell.Validate(); err != nil {
				t.Errorf("decoded cell does not validate: %v", err)
			}
			if err := req.Exit.Validate(); err != nil {
				t.Errorf("decoded jet frame does not validate: %v", err)
			}
			if len(req.Points) == 0 {
				t.Errorf("got no operating points, want at least one")
			}
			for _, c := range req.Points {
				if err := c.Validate(req.Nozzle); err != nil {
					t.Errorf("operating point %q does not validate: %v", c.Name, err)
				}
			}
			for _, a := range req.Arrays {
				if _, ok := req.Stand(a.Stand); a.Stand != "" && !ok {
					t.Errorf("array %q: stand %q does not resolve", a.Name, a.Stand)
				}
			}
		}
		req2, warns2, err2 := Decode(name, data)
		if !reflect.DeepEqual(req, req2) || !reflect.DeepEqual(warns, warns2) || (err == nil) != (err2 == nil) || err != nil && err.Error() != err2.Error() {
			t.Errorf("a second decode gave a different answer")
		}
	})
}
