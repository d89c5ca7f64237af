package export

import (
	"github.com/paulmach/orb"
	"github.com/paulmach/orb/geojson"

	"arcwright/internal/planner"
)

// addCrew adds a point per crew position with its worst exposure over
// the operating points: the worst status, and of equal statuses the
// loudest dB(A).
func (c *collection) addCrew(p *planner.Plan) {
	for i := 0; i < len(p.Crew); {
		j, loud := i, i
		for ; j < len(p.Crew) && p.Crew[j].Name == p.Crew[i].Name; j++ {
			e, w := &p.Crew[j], &p.Crew[loud]
			if e.Status > w.Status || e.Status == w.Status && !(e.AWeighted <= w.AWeighted) {
				loud = j
			}
		}
		e := p.Crew[loud]
		pt, ok := c.point(e.At.X, e.At.Y)
		status, _ := verdictName(e.Status)
		c.add(layerCrew, e.Name, pt, ok, geojson.Properties{
			"name": e.Name, "z_m": metres(e.At.Z), "hours": sig(e.Hours),
			"a_weighted_db": decibels(e.AWeighted), "peak_db": decibels(e.Peak), "point": e.Point, "status": status,
		})
		i = j
	}
}

// addNoise adds a MultiLineString per contour of the noise map.
func (c *collection) addNoise(m *planner.NoiseMap) {
	for _, k := range m.Contours {
		ml := orb.MultiLineString{} // an empty list, not null, when the contour has no line
		ok := true
		for _, l := range k.Lines {
			ls, good := c.path(l)
			ok = ok && good
			ml = append(ml, ls)
		}
		weighting := "A"
		if k.Peak {
			weighting = "C peak"
		}
		c.add(layerNoise, k.Label(), ml, ok, geojson.Properties{
			"level_db": k.Level, "weighting": weighting, "point": m.Point, "height_m": metres(m.Height), "everywhere": k.Everywhere,
		})
	}
}
