package layout

import (
	"math"
	"os"
	"path/filepath"
	"regexp"
	"testing"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// TestDemoLayouts decodes each demo layout without error or warning and
// checks the facts its comments promise.
func TestDemoLayouts(t *testing.T) {
	tests := []struct {
		file  string
		check func(t *testing.T, r *planner.Request)
	}{
		{"anechoic-model-jet.yaml", func(t *testing.T, r *planner.Request) {
			check(t, "Kind", r.Cell.Kind, geometry.Anechoic)
			checkF(t, "Ceiling", r.Cell.Ceiling, 6)
			checkF(t, "CutOff", r.CutOff, 100)
			check(t, "Nozzle", r.Nozzle, jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508})
			check(t, "len(Points)", len(r.Points), 4)
			check(t, "Collector", r.Cell.Collector != nil, true)
			check(t, "Band", r.Band, planner.Band{Low: 200, High: 80000})
			kinds := map[planner.ArrayKind]bool{}
			for _, a := range r.Arrays {
				kinds[a.Kind] = true
			}
			for _, k := range []planner.ArrayKind{planner.Arc, planner.Line, planner.NearField, planner.Probes} {
				check(t, "has "+k.String(), kinds[k], true)
			}
			check(t, "arc AutoRadius", r.Arrays[0].AutoRadius, true)
		}},
		{"outdoor-static-pad.yaml", func(t *testing.T, r *planner.Request) {
			check(t, "Kind", r.Cell.Kind, geometry.OutdoorPad)
			check(t, "Floor", r.Cell.Floor, geometry.Hard)
			check(t, "open sky", math.IsInf(r.Cell.Ceiling, 1), true)
			check(t, "Units", r.Units, units.Imperial)
			check(t, "Convention", r.Convention, planner.FromInlet)
			// hand-computed: 656 ft × 492 ft = 199.9488 m × 149.9616 m.
			b := r.Cell.Boundary.Bound()
			checkF(t, "site width", b.Max[0]-b.Min[0], 199.9488)
			checkF(t, "site depth", b.Max[1]-b.Min[1], 149.9616)
			checkF(t, "arc radius", r.Arrays[0].Radius, 45)
			check(t, "arc on the ground", r.Arrays[0].HasHeight && r.Arrays[0].Height == 0, true)
			check(t, "arc stand", r.Arrays[0].Stand, "")
			checkF(t, "elevated height", r.Arrays[1].Fixed[0].At.Z, 1.2)
			check(t, "Band", r.Band, planner.Band{Low: 50, High: 10000})
		}},
		{"hard-wall-exhaust-room.yaml", func(t *testing.T, r *planner.Request) {
			check(t, "Kind", r.Cell.Kind, geometry.HardWalled)
			checkF(t, "Ceiling", r.Cell.Ceiling, 3)
			checkF(t, "Diameter", r.Nozzle.Diameter, 0.075)
			checkF(t, "T0", r.Points[0].Primary.TotalTemperature, 600)
			checkF(t, "Exit.Z", r.Exit.Exit.Z, 0.8) // 800 in mm, the file's length unit
			check(t, "Band", r.Band, planner.Band{Low: 100, High: 10000})
		}},
	}
	for _, tt := range tests {
		t.Run(tt.file, func(t *testing.T) {
			path := filepath.Join(repoRoot, "layouts", tt.file)
			data, err := os.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			r, warns := mustDecode(t, string(data))
			if len(warns) != 0 {
				t.Errorf("got warnings %v, want none", warns)
			}
			tt.check(t, r)
		})
	}
}

func TestStarter(t *testing.T) {
	text := string(Starter())
	r, warns := mustDecode(t, text)
	if len(warns) != 0 {
		t.Errorf("got warnings %v, want none", warns)
	}
	t.Run("every pattern", func(t *testing.T) {
		kinds := map[planner.ArrayKind]bool{}
		for _, a := range r.Arrays {
			kinds[a.Kind] = true
		}
		for k := planner.Arc; k <= planner.Probes; k++ {
			check(t, "has "+k.String(), kinds[k], true)
		}
	})
	t.Run("every key explained", func(t *testing.T) {
		for _, keys := range [][]string{
			topKeys, titleKeys, unitsKeys, sheetKeys, ambientKeys, cellKeys, obstacleKeys, collectorKeys, markKeys,
			circleKeys, nozzleKeys, opKeys, limitKeys, bandKeys, standKeys, arrayKeys, arcKeys, lineKeys, nearKeys,
			ringKeys, pointKeys, rangeKeys, noiseKeys, crewKeys, microphoneKeys, anchorKeys,
		} {
			for _, k := range keys {
				// the key, followed by ':' and a comment on the same line (or on the next lines).
				re := regexp.MustCompile(`(?m)^[ #\-{]*.*\b` + regexp.QuoteMeta(k) + `:.*#`)
				if !re.MatchString(text) {
					t.Errorf("key %q: got no commented line, want one", k)
				}
			}
		}
	})
	t.Run("fresh copy", func(t *testing.T) {
		a := Starter()
		a[0] = '!'
		if b := Starter(); b[0] == '!' {
			t.Errorf("got a shared slice, want a new one on each call")
		}
	})
}
