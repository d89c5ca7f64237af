package planner

import (
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
)

// plate returns the fixture chamber with its collector removed, a 10 mm
// plate across the jet 1 m downstream of the exit and two probes (no
// stands) 0.13 m in front of the plate, 0.5 m either side of the axis. The fixture's
// hot-0.9 point (NPR 1.86, 800 K total) gives Uj ≈ 511 m/s (hand-computed:
// T = 800/1.86^0.2857 = 670 K, Uj = √(2·1005·130) m/s).
func plate() *Request {
	req := chamber()
	req.Cell.Collector = nil
	req.Cell.Obstacles = append(req.Cell.Obstacles, geometry.Obstacle{
		Name:      "plate",
		Footprint: geometry.Polygon(orb.Ring{{4, 3.5}, {4.01, 3.5}, {4.01, 5.5}, {4, 5.5}, {4, 3.5}}),
		ZMin:      0, ZMax: 2.5,
	})
	req.Arrays = []Array{{Name: "P", Kind: Probes, Fixed: []Fixed{
		{Name: "left", At: r3.Vec{X: 3.87, Y: 5.0, Z: 1.5}},
		{Name: "right", At: r3.Vec{X: 3.87, Y: 4.0, Z: 1.5}},
	}}}
	return req
}

// TestObstacleImpingement: a jet that strikes an obstacle is reported like
// one that strikes a wall (issue 10 item 11), and probes just in front of
// the struck plate are not ok.
func TestObstacleImpingement(t *testing.T) {
	p := mustPlan(t, plate())
	found := false
	for _, w := range p.Warnings {
		if strings.Contains(w, "strikes the obstacle plate") && strings.Contains(w, "wall jet") {
			found = true
		}
	}
	if !found {
		t.Errorf("no impingement warning for the plate in %q", p.Warnings)
	}
	for _, st := range p.Stations {
		if st.Status == OK {
			t.Errorf("%s: 0.13 m in front of the struck plate is ok, want at least a warning", st.ID)
		}
		c, _ := st.Check(CheckObstacle)
		if c.Verdict != Warn || !strings.Contains(c.Reason, "plate, which the") {
			t.Errorf("%s: obstacle check %v %q, want a warning naming the struck plate", st.ID, c.Verdict, c.Reason)
		}
	}
}

// TestZoneReaches checks the contacts a zone makes: the plate 1 m
// downstream is reached at or before 1 m (balls cover the zone, so the
// first contact may be a little upstream of the face, never downstream);
// the fixture's rig, whose face is 50 mm behind the exit plane, and a post
// 2 m to the side are not reached.
func TestZoneReaches(t *testing.T) {
	req := plate()
	req.Cell.Obstacles = append(req.Cell.Obstacles, geometryColumn(orb.Point{5, 6.5}, 0.1, 0, 3))
	p := mustPlan(t, req)
	ix := geometry.NewIndex(req.Cell.Solids())
	for _, pt := range p.Points {
		env := pt.Velocity()
		got := zoneReaches(req, ix, env, captureX(req, &pt))
		var names []string
		for _, c := range got {
			if c.surface != surfaceObstacle {
				continue
			}
			o := req.Cell.Obstacles[c.obstacle]
			names = append(names, o.Name)
			if o.Name == "plate" && (c.x > 1 || c.x < 0.6) {
				t.Errorf("%s: plate reached at x = %.3f m, want within 0.6–1 m", pt.Name, c.x)
			}
		}
		if strings.Join(names, ",") != "plate" {
			t.Errorf("%s: obstacles reached %v, want only the plate", pt.Name, names)
		}
	}
}

// TestSplashDepth: a probe far from the plate's face is not in its splash
// region; one touching it is.
func TestSplashDepth(t *testing.T) {
	for _, tt := range []struct {
		x    float64
		want bool
	}{{3.87, true}, {2.4, false}} {
		req := plate()
		req.Arrays[0].Fixed = req.Arrays[0].Fixed[:1]
		req.Arrays[0].Fixed[0].At.X = tt.x
		req.Arrays[0].Fixed[0].At.Y = 5.5
		p := mustPlan(t, req)
		c, _ := p.Stations[0].Check(CheckObstacle)
		if got := strings.Contains(c.Reason, "strikes"); got != tt.want {
			t.Errorf("probe at x = %g: splash %v (%s), want %v", tt.x, got, c.Reason, tt.want)
		}
	}
}

// TestFirstContactX: the reported contact is where the zone first meets a
// surface, not the centre of a search ball or the next outline vertex
// (review of the pad demo: the fence at 298 ft was reported at 217–232 ft,
// the site limit at 396 ft at 402–422 ft). Hand-computed geometry: the
// plate's upstream face is at cell X = 4, 1 m downstream of the exit at
// X = 3 (DERIVED from the fixture); a far wall or site limit at cell X = 5
// is 2 m downstream. The contact is reported no more than 1 mm early.
func TestFirstContactX(t *testing.T) {
	for _, tt := range []struct {
		name    string
		kind    geometry.Kind
		surface surface
		wallX   float64 // far boundary, cell X, m; 0 keeps the fixture's
		want    float64 // jet-frame x of the surface, m
	}{
		{"plate 1 m downstream", geometry.Anechoic, surfaceObstacle, 0, 1},
		{"wall 2 m downstream", geometry.Anechoic, surfaceBoundary, 5, 2},
		{"site limit 2 m downstream", geometry.OutdoorPad, surfaceBoundary, 5, 2},
	} {
		t.Run(tt.name, func(t *testing.T) {
			req := plate()
			req.Cell.Kind = tt.kind
			if tt.wallX != 0 {
				req.Cell.Obstacles = req.Cell.Obstacles[:1] // the rig only
				req.Cell.Boundary = orb.Ring{{0, 0}, {tt.wallX, 0}, {tt.wallX, 9}, {0, 9}, {0, 0}}
				req.Arrays[0].Fixed = []Fixed{{Name: "p", At: r3.Vec{X: 1, Y: 1, Z: 1.5}}}
			}
			p := mustPlan(t, req)
			ix := geometry.NewIndex(req.Cell.Solids())
			n := 0
			for _, pt := range p.Points {
				env := pt.Velocity()
				if env.Length <= tt.want+0.05 {
					continue
				}
				for _, c := range zoneReaches(req, ix, env, captureX(req, &pt)) {
					if c.surface != tt.surface {
						continue
					}
					n++
					if c.x < tt.want-0.001 || c.x > tt.want+geometry.BoundaryTol+1e-9 {
						t.Errorf("%s: contact at x = %.4f m, want %.3f m (within 1 mm upstream)", pt.Name, c.x, tt.want)
					}
				}
			}
			if n == 0 {
				t.Fatalf("no contact with the surface at all")
			}
		})
	}
}

// TestSiteLimitWording: an outdoor site limit is not a wall (issue 8): the
// warning for a zone that reaches it says the exhaust runs on beyond it,
// off the site, and tells who must be kept out, and says nothing of a wall
// jet or of keeping clear of "that surface"; a wall of a room keeps its
// wall-jet warning.
func TestSiteLimitWording(t *testing.T) {
	for _, tt := range []struct {
		kind      geometry.Kind
		want, not []string
	}{
		{geometry.OutdoorPad, []string{"reaches the site limit", "runs on beyond", "off the site", "neighbours"}, []string{"wall jet", "that surface"}},
		{geometry.Anechoic, []string{"reaches the walls", "wall jet"}, []string{"site limit", "runs on beyond"}},
	} {
		req := plate()
		req.Cell.Kind = tt.kind
		req.Cell.Obstacles = req.Cell.Obstacles[:1]
		req.Cell.Boundary = orb.Ring{{0, 0}, {5, 0}, {5, 9}, {0, 9}, {0, 0}}
		req.Arrays[0].Fixed = []Fixed{{Name: "p", At: r3.Vec{X: 1, Y: 1, Z: 1.5}}}
		p := mustPlan(t, req)
		n := 0
		for _, w := range p.Warnings {
			if !strings.Contains(w, "reaches the site limit") && !strings.Contains(w, "reaches the walls") {
				continue
			}
			n++
			for _, s := range tt.want {
				if !strings.Contains(w, s) {
					t.Errorf("%v: %q lacks %q", tt.kind, w, s)
				}
			}
			for _, s := range tt.not {
				if strings.Contains(w, s) {
					t.Errorf("%v: %q says %q", tt.kind, w, s)
				}
			}
		}
		if n == 0 {
			t.Errorf("%v: no boundary warning in %q", tt.kind, p.Warnings)
		}
	}
}
