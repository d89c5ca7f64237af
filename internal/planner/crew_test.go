package planner

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// crewZoneWords is what a crew position inside a zone says; no other
// status may say it.
const crewZoneWords = "no one may stand here during"

// TestCrewZoneMatchesStation is the crew's safety property: over random
// cells and jets, a crew position and a station at the same spot get the
// same zone verdict. The station stands on a stand the size of a person
// (a column from the floor to the ears, 0.25 m in radius, the body the
// crew check assumes): a person standing at a crew position has legs and
// body below the ears, so a zone along the floor (a wall jet) or bent up
// by buoyancy reaches the person as it reaches a stand. The random
// requests include hot slow points (buoyant, so their zones bend) and low
// exits and outdoor pads (zones that reach the ground and run along it).
// A zone verdict is the station's velocity or hot check blocked, or the
// crew position's status blocked saying no one may stand there, for any
// operating point.
func TestCrewZoneMatchesStation(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 5))
	inZone, clear, bent, wall := 0, 0, 0, 0
	for n := 0; n < 60; n++ {
		req := randomRequest(rng)
		if n%3 == 0 {
			req.Cell.Kind, req.Cell.Ceiling = geometry.OutdoorPad, math.Inf(1)
		}
		if n%2 == 0 {
			// hot and slow: buoyant, its zones bend
			req.Points = append(req.Points, jet.Condition{Name: "warm", Primary: jet.Stream{NPR: 1.02 + 0.1*rng.Float64(), TotalTemperature: 600 + 300*rng.Float64()}})
		}
		if n%4 == 1 {
			req.Exit.Exit.Z = 0.4 + 0.4*rng.Float64() // low: the zones reach the floor
		}
		probe, err := New(req)
		if err != nil {
			t.Fatalf("request %d: %v", n, err)
		}
		reach, width := 0.0, 0.0
		for _, pt := range probe.Points {
			for _, e := range []*jet.Envelope{pt.Velocity(), pt.Hot()} {
				reach, width = math.Max(reach, e.Length), math.Max(width, e.MaxRadius)
			}
		}
		req.Stands = append(req.Stands, Stand{Name: "person", PoleDiameter: 2 * crewBodyRadius, BaseRadius: crewBodyRadius})
		var fixed []Fixed
		req.Crew = nil
		for i := 0; i < 16; i++ {
			q := geometry.JetPoint{X: -0.5 + (1.3*reach+1)*rng.Float64(), R: (1.5*width + 1.5) * rng.Float64(), Azimuth: 2 * math.Pi * rng.Float64()}
			at := req.Exit.ToCell(q)
			at.Z = math.Max(at.Z, 0.3+1.5*rng.Float64())
			if at.Z > req.Cell.Ceiling {
				at.Z = req.Cell.Ceiling - 0.05
			}
			name := string(rune('a' + i))
			fixed = append(fixed, Fixed{Name: name, At: at})
			req.Crew = append(req.Crew, Crew{Name: name, At: at, Hours: 1})
		}
		req.Arrays = append(req.Arrays, Array{Name: "X", Kind: Points, Stand: "person", Fixed: fixed})
		p, err := New(req)
		if err != nil {
			t.Fatalf("request %d: %v", n, err)
		}
		crew := map[string][]CrewExposure{}
		for _, e := range p.Crew {
			crew[e.Name] = append(crew[e.Name], e)
		}
		for i := range p.Stations {
			s := &p.Stations[i]
			if s.Array != "X" {
				continue
			}
			name := s.ID[strings.LastIndex(s.ID, "X")+1:]
			for _, f := range fixed {
				if s.Mic == f.At {
					name = f.Name
				}
			}
			stationIn := false
			for _, c := range []string{CheckVelocity, CheckHot} {
				if ch, ok := s.Check(c); ok && ch.Verdict == Blocked {
					stationIn = true
					bent += strings.Count(ch.Reason, "bent by buoyancy")
					wall += strings.Count(ch.Reason, "wall jet")
				}
			}
			crewIn := false
			for _, e := range crew[name] {
				if strings.Contains(e.Reason, crewZoneWords) {
					if e.Status != Blocked {
						t.Fatalf("request %d, crew %s, %s: %v but says %q", n, name, e.Point, e.Status, e.Reason)
					}
					crewIn = true
				}
			}
			if len(crew[name]) == 0 {
				t.Fatalf("request %d: no crew entry for the spot of %s", n, s.ID)
			}
			if stationIn != crewIn {
				t.Fatalf("request %d, spot %s at %v: station in a zone %v (%q), crew in a zone %v (%q)",
					n, name, s.Mic, stationIn, s.Reasons, crewIn, crew[name][0].Reason)
			}
			if stationIn {
				inZone++
			} else {
				clear++
			}
		}
	}
	t.Logf("%d spots in a zone (%d by a bent zone, %d by a wall jet), %d clear", inZone, bent, wall, clear)
	if inZone < 50 || clear < 50 || bent == 0 || wall == 0 {
		t.Errorf("the property was barely exercised: %d in, %d clear, %d bent, %d wall jet", inZone, clear, bent, wall)
	}
}
