package layout

import (
	"errors"
	"io/fs"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

func TestErrorString(t *testing.T) {
	tests := []struct {
		name string
		e    Error
		want string
	}{
		{"all parts", Error{File: "layouts/cell.yaml", Line: 12, Field: "nozzle.diameter", Msg: `want a length, got "5 kg"`},
			`layouts/cell.yaml:12: nozzle.diameter: want a length, got "5 kg"`},
		{"no field", Error{File: "a.yaml", Line: 3, Msg: "bad YAML: x"}, "a.yaml:3: bad YAML: x"},
		{"no line", Error{File: "a.yaml", Msg: "cannot read the file: gone"}, "a.yaml: cannot read the file: gone"},
		{"no file", Error{Line: 4, Field: "band", Msg: "m"}, "line 4: band: m"},
		{"message only", Error{Msg: "m"}, "m"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.e.Error(); got != tt.want {
				t.Errorf("Error(): got %q, want %q", got, tt.want)
			}
			w := Warning{File: tt.e.File, Line: tt.e.Line, Field: tt.e.Field, Msg: tt.e.Msg}
			if got := w.String(); got != tt.want {
				t.Errorf("Warning.String(): got %q, want %q", got, tt.want)
			}
		})
	}
	es := Errors{{Msg: "one"}, {Msg: "two"}}
	if got, want := es.Error(), "one\ntwo"; got != want {
		t.Errorf("Errors.Error(): got %q, want %q", got, want)
	}
}

func TestErrorKinds(t *testing.T) {
	tests := []struct {
		name  string
		text  string
		kind  error // sentinel the first problem wraps
		field string
		cause any // pointer to a target for errors.As, or an error for errors.Is; nil for none
	}{
		{"unknown key", edit(t, baseLayout, "  ceiling: 4 m\n", "  ceiling: 4 m\n  height: 4 m\n"), ErrUnknownKey, "cell.height", nil},
		{"missing", edit(t, baseLayout, "  ceiling: 4 m\n", ""), ErrMissing, "cell.ceiling", nil},
		{"syntax", "a: [\n", ErrSyntax, "", nil},
		{"wrong type", edit(t, baseLayout, "  exit: [2, 3]", "  exit: 2"), ErrWrongType, "nozzle.exit", nil},
		{"duplicate", edit(t, baseLayout, "    temperature_ratio: 1\n", "    temperature_ratio: 1\n  - name: P1\n    npr: 2\n    temperature_ratio: 1\n"), ErrDuplicateName, "operating_points[1].name", nil},
		{"unresolved", edit(t, baseLayout, "    stand: tripod\n", "    stand: mast\n"), ErrUnresolved, "arrays[0].stand", nil},
		{"unit", edit(t, baseLayout, "diameter: 50.8 mm", "diameter: 5 kg"), ErrInvalid, "nozzle.diameter", new(*units.Error)},
		{"not finite", edit(t, baseLayout, "diameter: 50.8 mm", "diameter: NaN mm"), ErrInvalid, "nozzle.diameter", new(*units.Error)},
		{"ring", edit(t, baseLayout, ", [0, 6], [0, 0]]", ", [0, 6]]"), ErrInvalid, "cell.boundary", geometry.ErrNotClosed},
		{"stream", edit(t, baseLayout, "npr: 1.5", "npr: 0.9"), ErrInvalid, "operating_points[0].npr", new(*jet.InputError)},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			es := decodeErrors(t, tt.text)
			if !errors.Is(es, tt.kind) {
				t.Errorf("errors.Is(%v): got false, want true", tt.kind)
			}
			var first *Error
			if !errors.As(es, &first) {
				t.Fatal("errors.As(*Error): got false, want true")
			}
			check(t, "Field", first.Field, tt.field)
			check(t, "File", first.File, "test.yaml")
			switch c := tt.cause.(type) {
			case error:
				if !errors.Is(es, c) {
					t.Errorf("errors.Is(%v): got false, want true", c)
				}
			case **units.Error:
				if !errors.As(es, c) {
					t.Errorf("errors.As(*units.Error): got false, want true")
				}
			case **jet.InputError:
				if !errors.As(es, c) {
					t.Errorf("errors.As(*jet.InputError): got false, want true")
				}
			}
		})
	}
}

func TestEveryErrorInOnePass(t *testing.T) {
	tests := []struct {
		name   string
		text   string
		fields []string // every field with a problem, sorted by line then field
	}{
		{"every bad input of a stream", edit(t, baseLayout, "npr: 1.5\n    temperature_ratio: 1\n",
			"npr: 0.9\n    temperature_ratio: -1\n    gamma: 2\n    gas_constant: 0\n"),
			[]string{"operating_points[0].npr", "operating_points[0].temperature_ratio", "operating_points[0].gamma", "operating_points[0].gas_constant"}},
		{"an unusable length unit hides the bare lengths it would read", edit(t, baseLayout, "polar_angle: from_jet_axis\n",
			"polar_angle: from_jet_axis\nunits:\n  length: furlong\n"),
			[]string{"units.length"}},
		{"errors in separate sections", edit(t, baseLayout, "  ceiling: 4 m", "  ceiling: -4 m", "  low: 200 Hz", "  low: 0 Hz", "    pole_diameter: 25 mm\n", ""),
			[]string{"cell.ceiling", "band.low", "stands[0].pole_diameter"}},
		{"a second document", baseLayout + "---\narcwright: 1\n", []string{""}},
		{"not finite numbers", edit(t, baseLayout, "npr: 1.5", "npr: .nan", "  axis_height: 1.5 m", "  axis_height: Inf m"),
			[]string{"nozzle.axis_height", "operating_points[0].npr"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			es := decodeErrors(t, tt.text)
			var got []string
			for _, e := range es {
				got = append(got, e.Field)
			}
			if strings.Join(got, "|") != strings.Join(tt.fields, "|") {
				t.Errorf("fields: got %q, want %q\n%v", got, tt.fields, es)
			}
			if !sort.SliceIsSorted(es, func(i, j int) bool {
				return es[i].Line < es[j].Line || es[i].Line == es[j].Line && es[i].Field < es[j].Field
			}) {
				t.Errorf("got errors out of order:\n%v", es)
			}
		})
	}
}

func TestLoad(t *testing.T) {
	t.Run("missing file", func(t *testing.T) {
		path := filepath.Join(t.TempDir(), "none.yaml")
		req, warns, err := Load(path)
		if req != nil || warns != nil {
			t.Errorf("got a request or warnings with the error")
		}
		if !errors.Is(err, ErrRead) || !errors.Is(err, fs.ErrNotExist) {
			t.Errorf("got %v, want an error wrapping ErrRead and fs.ErrNotExist", err)
		}
		want := path + ": cannot read the file: no such file or directory"
		if err == nil || err.Error() != want {
			t.Errorf("got %v, want %q", err, want)
		}
	})
	t.Run("demo file", func(t *testing.T) {
		req, _, err := Load(filepath.Join(repoRoot, "layouts", "hard-wall-exhaust-room.yaml"))
		if err != nil {
			t.Fatal(err)
		}
		check(t, "Source", req.Source, filepath.Join(repoRoot, "layouts", "hard-wall-exhaust-room.yaml"))
	})
}

// lineOf returns the 1-based line of the first line of text holding s.
func lineOf(t *testing.T, text, s string) int {
	t.Helper()
	for i, l := range strings.Split(text, "\n") {
		if strings.Contains(l, s) {
			return i + 1
		}
	}
	t.Fatalf("%q is not in the text", s)
	return 0
}

func TestWarnings(t *testing.T) {
	collector := func(inlet string) string {
		return edit(t, baseLayout, "  ceiling: 4 m\n", "  ceiling: 4 m\n  collector:\n    inlet: "+inlet+"\n    diameter: 1.2 m\n")
	}
	noArrays := baseLayout[:strings.Index(baseLayout, "arrays:")]
	cutoff := edit(t, baseLayout, "  ceiling: 4 m\n", "  ceiling: 4 m\n  cutoff: 250 Hz\n")
	noStand := edit(t, baseLayout, "    stand: tripod\n", "")
	tests := []struct {
		name string
		text string
		want []Warning
	}{
		{"collector on the axis", collector("[7, 3.5, 1.5]"), nil},
		{"collector off the axis", collector("[7, 4, 1.5]"), []Warning{{File: "test.yaml", Line: lineOf(t, collector("[7, 4, 1.5]"), "collector:"), Field: "cell.collector.inlet",
			Msg: "the collector inlet centre is 1.000 m off the jet axis, more than its radius 600.0 mm"}}},
		{"collector upstream", collector("[1, 3, 1.5]"), []Warning{{File: "test.yaml", Line: lineOf(t, collector("[1, 3, 1.5]"), "collector:"), Field: "cell.collector.inlet",
			Msg: "the collector inlet is not downstream of the nozzle exit (-1.000 m along the jet axis)"}}},
		{"no arrays", noArrays, []Warning{{File: "test.yaml", Line: 1, Field: "arrays", Msg: "no arrays: there are no stations to plan"}}},
		{"band below the cut-off", cutoff, []Warning{{File: "test.yaml", Line: lineOf(t, cutoff, "band:"), Field: "band.low",
			Msg: "the band starts at 200 Hz, below the treatment cut-off 250 Hz: the cell is not anechoic there"}}},
		{"no stand, off the floor", noStand, []Warning{{File: "test.yaml", Line: lineOf(t, noStand, "- name: A"), Field: "arrays[0]",
			Msg: "no stand, so the microphones are flush on the floor, but the stations are not at floor level; name a stand, or put the stations at height 0"}}},
		{"no stand, on the floor", edit(t, noStand, "      polar:", "      height: 0 m\n      polar:"), nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			req, got := mustDecode(t, tt.text)
			if len(got) != len(tt.want) {
				t.Fatalf("got %d warnings %v, want %d %v", len(got), got, len(tt.want), tt.want)
			}
			for i := range got {
				if got[i] != tt.want[i] {
					t.Errorf("warning %d: got %q, want %q", i, got[i], tt.want[i])
				}
			}
			// the request carries them, so that plan and check show what
			// validate shows
			if len(req.Notes) != len(tt.want) {
				t.Fatalf("got %d notes in the request %q, want %d", len(req.Notes), req.Notes, len(tt.want))
			}
			for i, w := range tt.want {
				if req.Notes[i] != w.String() {
					t.Errorf("note %d: got %q, want %q", i, req.Notes[i], w.String())
				}
			}
			if len(req.Arrays) > 0 {
				p, err := planner.New(req)
				if err != nil {
					t.Fatal(err)
				}
				for i, w := range tt.want {
					if i >= len(p.Warnings) || p.Warnings[i] != w.String() {
						t.Errorf("the plan's warnings do not start with %q: %q", w.String(), p.Warnings)
					}
				}
			}
		})
	}
}
