package layout

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/planner"
)

func TestDecodeAsBuilt(t *testing.T) {
	tests := []struct {
		name string
		csv  string
		bare string
		want map[string]planner.Placement
	}{
		{"metres", "id,x,y,z\nA-01,5.1,7.2,1.4\n", "", map[string]planner.Placement{
			"A-01": {Mic: r3.Vec{X: 5.1, Y: 7.2, Z: 1.4}}}},
		{"units and any column order", "# measured 2026-11-30\nz, id, y, x\n1.4 m, A-01, 720 cm, 16 ft 8 in\n", "m", map[string]planner.Placement{
			// hand-computed: 16 ft 8 in = 200 in × 0.0254 m/in = 5.08 m (1959 agreement).
			"A-01": {Mic: r3.Vec{X: 5.08, Y: 7.2, Z: 1.4}}}},
		{"bare millimetres, bases", "id,x,y,z,base_x,base_y\nA-01,5100,7200,1400,5300,7400\nA-02,6000,7000,0,,\n", "mm", map[string]planner.Placement{
			"A-01": {Mic: r3.Vec{X: 5.1, Y: 7.2, Z: 1.4}, Base: &orb.Point{5.3, 7.4}},
			"A-02": {Mic: r3.Vec{X: 6, Y: 7}}}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := DecodeAsBuilt("built.csv", []byte(tt.csv), tt.bare, 4)
			if err != nil {
				t.Fatal(err)
			}
			if len(got) != len(tt.want) {
				t.Fatalf("got %d positions, want %d", len(got), len(tt.want))
			}
			for id, w := range tt.want {
				g, ok := got[id]
				if !ok {
					t.Fatalf("%s: missing", id)
				}
				checkF(t, id+".X", g.Mic.X, w.Mic.X)
				checkF(t, id+".Y", g.Mic.Y, w.Mic.Y)
				checkF(t, id+".Z", g.Mic.Z, w.Mic.Z)
				if (g.Base == nil) != (w.Base == nil) {
					t.Fatalf("%s.Base: got %v, want %v", id, g.Base, w.Base)
				}
				if w.Base != nil {
					checkF(t, id+".Base.X", g.Base[0], w.Base[0])
					checkF(t, id+".Base.Y", g.Base[1], w.Base[1])
				}
			}
		})
	}
}

func TestDecodeAsBuiltErrors(t *testing.T) {
	tests := []struct {
		name string
		csv  string
		want string
	}{
		{"empty", "", "built.csv: the file holds no header row; want id, x, y, z and optionally base_x, base_y"},
		{"header only", "id,x,y,z\n", "built.csv: the file holds no positions; want one row per station after the header"},
		{"unknown and missing columns", "id,x,y,hieght\nA-01,1,2,3\n",
			"built.csv:1: hieght: unknown column \"hieght\"; did you mean \"height\"?\n" +
				"built.csv:1: z: missing column; want id, x, y, z and optionally base_x, base_y"},
		{"one base column", "id,x,y,z,base_x\nA-01,1,2,3,4\n", "built.csv:1: base_y: give both base_x and base_y, or neither"},
		{"bad rows", "id,x,y,z\nA-01,1,2,-1\nA-01,1,2,1\n,1,2,1\nB-01,1 kg,2,9\nC-01,1,2\nD-01,1,2,3,4\n",
			"built.csv:2: z: the station is below the floor: -1.000 m\n" +
				"built.csv:3: id: station \"A-01\" is already given at line 2\n" +
				"built.csv:4: id: missing; want the station ID, such as A-01\n" +
				"built.csv:5: x: want a length, got \"1 kg\" (kg is a mass unit)\n" +
				"built.csv:5: z: the station is above the ceiling: 9.000 m, ceiling at 4.000 m\n" +
				"built.csv:6: z: want a length, got \"\" (empty)\n" +
				"built.csv:7: bad CSV: 5 fields, but the header names 4 columns"},
		{"not finite", "id,x,y,z\nA-01,NaN,2,1\n", "built.csv:2: x: want a length, got \"NaN\" (not a finite number)"},
		{"bad quoting", "id,x,y,z\n\"A-01,1,2,1\n", "built.csv:2: bad CSV: extraneous or missing \" in quoted-field"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := DecodeAsBuilt("built.csv", []byte(tt.csv), "m", 4)
			if got != nil {
				t.Errorf("got positions %v with the error, want nil", got)
			}
			var es Errors
			if !errors.As(err, &es) {
				t.Fatalf("got %v, want Errors", err)
			}
			if err.Error() != tt.want {
				t.Errorf("got\n%s\nwant\n%s", err, tt.want)
			}
		})
	}
}

func TestLoadAsBuilt(t *testing.T) {
	// The hard-walled demo reads bare lengths in millimetres; so does its
	// as-built file.
	layoutPath := filepath.Join(repoRoot, "layouts", "hard-wall-exhaust-room.yaml")
	req, _, err := Load(layoutPath)
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	csvPath := filepath.Join(dir, "built.csv")
	if err := os.WriteFile(csvPath, []byte("id,x,y,z\nref-side,3010,590,1200\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	got, err := LoadAsBuilt(csvPath, req)
	if err != nil {
		t.Fatal(err)
	}
	checkF(t, "ref-side.X", got["ref-side"].Mic.X, 3.01)
	checkF(t, "ref-side.Y", got["ref-side"].Mic.Y, 0.59)

	t.Run("request without a length unit reads metres", func(t *testing.T) {
		r := *req
		r.LengthUnit = ""
		p := filepath.Join(dir, "built2.csv")
		if err := os.WriteFile(p, []byte("id,x,y,z\nref-side,3010,590,1200 mm\n"), 0o644); err != nil {
			t.Fatal(err)
		}
		got, err := LoadAsBuilt(p, &r)
		if err != nil {
			t.Fatal(err)
		}
		checkF(t, "ref-side.X in metres", got["ref-side"].Mic.X, 3010)
	})
	t.Run("missing file", func(t *testing.T) {
		_, err := LoadAsBuilt(filepath.Join(dir, "none.csv"), req)
		if !errors.Is(err, ErrRead) || !strings.Contains(err.Error(), "cannot read the file") {
			t.Errorf("got %v, want an ErrRead", err)
		}
	})
}

func TestDecodeAsBuiltPanics(t *testing.T) {
	defer func() {
		if recover() == nil {
			t.Errorf("got no panic for a bare unit of yards, want one")
		}
	}()
	DecodeAsBuilt("x.csv", []byte("id,x,y,z\n"), "yd", math.Inf(1))
}

// FuzzDecodeAsBuilt checks that any bytes give either positions or a
// non-empty Errors value, never a panic, and finite positions only.
func FuzzDecodeAsBuilt(f *testing.F) {
	for _, s := range []string{
		"id,x,y,z\nA-01,5.1,7.2,1.4\n",
		"id,x,y,z,base_x,base_y\nA-01,5100,7200,1400,5300,7400\nA-02,6000,7000,0,,\n",
		"z, id, y, x\n1.4 m, A-01, 720 cm, 16 ft 8 in\n",
		"id,x,y,z\nA-01,1,2,-1\nA-01,1,2,1\n,1,2,1\nB-01,1 kg,2,9\nC-01,1,2\nD-01,1,2,3,4\n",
		"id,x,y,z\n\"A-01,1,2,1\n",
		"",
		"\ufeffid;x;y;z\nA-01;5,1;7,2;1,4\n",
		"id\tx\ty\tz\nA-01\t5.1\t7.2\t1.4\n",
		"# comment; with, separators\nid;x_m;y_m;z_m;reasons\nA-01;1,5;2;0,5;a, b\n",
		"id,x,y,z\nA-01,5\xe9,7,1\n",
		"id,channel,x_m,y_m,z_m,height_m\nA-01,,5,7,1.5,1.6\nA-02,,5,7,,1.2\n",
		"id,x,y,z,base_x,base_y\nA-01,,,,,\nA-02,,,,,\n",
		"id,x_ft,y_ft,height_ft,base_x_ft,base_y_ft\nG-01,10,20,5,10,20\n",
	} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		got, err := DecodeAsBuilt("fuzz.csv", data, "mm", 6)
		if (got == nil) == (err == nil) {
			t.Fatalf("got positions %v and error %v, want exactly one", got != nil, err)
		}
		if err != nil {
			var es Errors
			if !errors.As(err, &es) || len(es) == 0 {
				t.Fatalf("got %T %v, want a non-empty Errors", err, err)
			}
			return
		}
		for id, p := range got {
			if id == "" || !finiteVec(p.Mic) || p.Mic.Z < 0 || p.Mic.Z > 6 {
				t.Errorf("%q: got %+v, want a named, finite position between floor and ceiling", id, p)
			}
			if p.Base != nil && (math.IsNaN(p.Base[0]) || math.IsInf(p.Base[0], 0) || math.IsNaN(p.Base[1]) || math.IsInf(p.Base[1], 0)) {
				t.Errorf("%q: got base %v, want finite", id, p.Base)
			}
		}
	})
}

// finiteVec reports whether every coordinate of v is finite.
func finiteVec(v r3.Vec) bool {
	return !math.IsNaN(v.X+v.Y+v.Z) && !math.IsInf(v.X, 0) && !math.IsInf(v.Y, 0) && !math.IsInf(v.Z, 0)
}
