package planner

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
)

// TestNoiseMap checks the contours against the station levels: every point
// of the 85 dB(A) contour is at 85 dB(A) within the interpolation error,
// the map covers the cell, and the loudest point is the one with the
// largest sound power.
func TestNoiseMap(t *testing.T) {
	req := chamber()
	req.Noise.Contours = []float64{120}
	p := mustPlan(t, req)
	m, err := p.NoiseMap()
	if err != nil {
		t.Fatal(err)
	}
	if m.Point != "hot-0.9" && m.Point != "cold-1.3" {
		t.Errorf("got the map for %s, want one of the loud points", m.Point)
	}
	if len(m.Contours) != 3 || m.Contours[0].Level != ContourA || m.Contours[1].Level != 120 || !m.Contours[2].Peak {
		t.Fatalf("got contours %+v, want 85 dB(A), 120 dB(A), 140 dB(C) peak", m.Contours)
	}
	if b := req.Cell.Boundary.Bound(); m.Bounds.Min != b.Min || m.Bounds.Max[0] < b.Max[0] || m.Bounds.Max[1] < b.Max[1] {
		t.Errorf("got bounds %v, want the cell's %v", m.Bounds, b)
	}
	ck := &checker{req: req, points: p.Points}
	atm := acoustics.Atmosphere{Temperature: req.Ambient.Temperature, RelativeHumidity: req.Ambient.Humidity, Pressure: req.Ambient.Pressure}
	nm, _ := newNoiseModel(req, p.Points, atm)
	ck.noise = nm
	k := indexOf(p.Points, m.Point)
	// a model jet is above 85 dB(A) everywhere in the chamber
	if !m.Contours[0].Everywhere || len(m.Contours[0].Lines) != 0 {
		t.Errorf("85 dB(A): got %d lines, everywhere %v; want everywhere", len(m.Contours[0].Lines), m.Contours[0].Everywhere)
	}
	for _, c := range m.Contours[1:2] {
		if c.Everywhere || len(c.Lines) == 0 {
			t.Errorf("%s: no line in the 12 m chamber", c.Label())
			continue
		}
		for _, l := range c.Lines {
			for _, q := range l {
				lv, err := ck.levelAt(k, r3.Vec{X: q[0], Y: q[1], Z: m.Height})
				if err != nil {
					continue
				}
				// linear interpolation on a 0.15 m grid: within 1.5 dB of the
				// level away from the source (hand-computed bound, 20·log10
				// of the distance ratio over one grid step at 1.5 m)
				if math.Abs(lv.AWeighted-c.Level) > 1.5 {
					t.Errorf("%s: point %v is at %.2f dB(A)", c.Label(), q, lv.AWeighted)
				}
			}
		}
	}
}
