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
