package export_test

import (
	"fmt"
	"io"
	"testing"

	"arcwright/internal/export"
	"arcwright/internal/planner"
)

// sizedPlan returns the fixture with its stations repeated to n stations
// (a large far-field survey), each with its own id and channel.
func sizedPlan(b *testing.B, n int) *planner.Plan {
	p := fixturePlan(b)
	base := p.Stations
	p.Stations = make([]planner.Station, n)
	for i := range p.Stations {
		s := base[i%len(base)]
		s.ID, s.Channel = fmt.Sprintf("%s.%d", s.ID, i), i+1
		p.Stations[i] = s
	}
	return p
}

func BenchmarkWriters(b *testing.B) {
	for _, w := range []struct {
		name  string
		write func(io.Writer, *planner.Plan) error
	}{
		{"JSON", export.JSON},
		{"CSV", export.CSV},
		{"GeoJSON", export.GeoJSON},
	} {
		for _, n := range []int{10, 500} {
			b.Run(fmt.Sprintf("%s/%d", w.name, n), func(b *testing.B) {
				p := sizedPlan(b, n)
				b.ReportAllocs()
				for b.Loop() {
					if err := w.write(io.Discard, p); err != nil {
						b.Fatal(err)
					}
				}
			})
		}
	}
}
