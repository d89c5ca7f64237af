package sheet

import (
	"math"
	"sort"
)

// hatchCell is the side of a hatch mask's cells, mm: fine enough that a
// label (about 2.5 mm high) is not judged on the hatch by a cell it only
// grazes, coarse enough to raster an A0 plan in a few milliseconds.
const hatchCell = 0.5

// hatchMask is a raster of the hatched regions of a view (the zones, the
// keep-outs, the treatment: every polygon whose style hatches), cut by
// their clips, with a summed-area table so that the hatched share of any
// box is found in constant time. A cell counts as hatched when its centre
// lies in a region.
type hatchMask struct {
	x0, y0 float64 // page position of the raster's top-left corner, mm
	nx, ny int
	sum    []int32 // summed-area table, (nx+1)·(ny+1)
}

// newHatchMask rasters the hatched polygons of shapes over bounds; nil
// when none is hatched.
func newHatchMask(bounds Rect, shapes []Shape) *hatchMask {
	nx, ny := int(math.Ceil(bounds.W/hatchCell)), int(math.Ceil(bounds.H/hatchCell))
	if nx <= 0 || ny <= 0 {
		return nil
	}
	m := &hatchMask{x0: bounds.X, y0: bounds.Y, nx: nx, ny: ny}
	var cells []bool
	rows := make([][]float64, ny)
	clipRows := make([][]float64, ny)
	var spans, clipSpans [][2]float64
	for _, s := range shapes {
		d, ok := s.Style.Def()
		if !ok || len(d.Hatches) == 0 || s.Kind != Polygon || len(s.Points) < 3 {
			continue
		}
		if cells == nil {
			cells = make([]bool, nx*ny)
		}
		m.crossings(rows, append([][]Pt{s.Points}, s.Holes...))
		clipped := len(s.Clip) >= 3
		if clipped {
			m.crossings(clipRows, [][]Pt{s.Clip})
		}
		for j := range ny {
			spans = pairs(spans[:0], rows[j])
			if clipped {
				clipSpans = pairs(clipSpans[:0], clipRows[j])
				spans = intersectSpans(spans, clipSpans)
			}
			for _, sp := range spans {
				i0 := max(0, int(math.Ceil((sp[0]-m.x0)/hatchCell-0.5)))
				i1 := min(nx-1, int(math.Floor((sp[1]-m.x0)/hatchCell-0.5)))
				for i := i0; i <= i1; i++ {
					cells[j*nx+i] = true
				}
			}
		}
	}
	if cells == nil {
		return nil
	}
	w := nx + 1
	m.sum = make([]int32, w*(ny+1))
	for j := range ny {
		var row int32
		for i := range nx {
			if cells[j*nx+i] {
				row++
			}
			m.sum[(j+1)*w+i+1] = m.sum[j*w+i+1] + row
		}
	}
	return m
}

// crossings fills rows[j] with the x (mm) where the rings' edges cross the
// centre line of raster row j, sorted; an edge counts for ymin <= y < ymax,
// so a line through a vertex is counted once.
func (m *hatchMask) crossings(rows [][]float64, rings [][]Pt) {
	for j := range rows {
		rows[j] = rows[j][:0]
	}
	for _, r := range rings {
		n := len(r)
		for k := range n {
			a, b := r[k], r[(k+1)%n]
			if a.Y == b.Y {
				continue
			}
			lo, hi := math.Min(a.Y, b.Y), math.Max(a.Y, b.Y)
			j0 := max(0, int(math.Ceil((lo-m.y0)/hatchCell-0.5)))
			j1 := min(m.ny-1, int(math.Ceil((hi-m.y0)/hatchCell-0.5))-1)
			for j := j0; j <= j1; j++ {
				y := m.y0 + (float64(j)+0.5)*hatchCell
				if y < lo || y >= hi {
					continue
				}
				rows[j] = append(rows[j], a.X+(y-a.Y)/(b.Y-a.Y)*(b.X-a.X))
			}
		}
	}
	for j := range rows {
		sort.Float64s(rows[j])
	}
}

// pairs appends the inside spans of sorted crossings xs (even-odd) to out.
func pairs(out [][2]float64, xs []float64) [][2]float64 {
	for i := 0; i+1 < len(xs); i += 2 {
		out = append(out, [2]float64{xs[i], xs[i+1]})
	}
	return out
}

// intersectSpans returns the common parts of two sorted lists of disjoint
// spans, written over a.
func intersectSpans(a, b [][2]float64) [][2]float64 {
	out := a[:0:0]
	i, k := 0, 0
	for i < len(a) && k < len(b) {
		lo, hi := math.Max(a[i][0], b[k][0]), math.Min(a[i][1], b[k][1])
		if lo < hi {
			out = append(out, [2]float64{lo, hi})
		}
		if a[i][1] < b[k][1] {
			i++
		} else {
			k++
		}
	}
	return out
}

// frac returns the share (0–1) of the cells whose centres lie in r that
// are hatched; 0 for a nil mask or a box that holds no cell centre.
func (m *hatchMask) frac(r Rect) float64 {
	if m == nil {
		return 0
	}
	i0 := max(0, int(math.Ceil((r.X-m.x0)/hatchCell-0.5)))
	i1 := min(m.nx-1, int(math.Floor((r.Right()-m.x0)/hatchCell-0.5)))
	j0 := max(0, int(math.Ceil((r.Y-m.y0)/hatchCell-0.5)))
	j1 := min(m.ny-1, int(math.Floor((r.Bottom()-m.y0)/hatchCell-0.5)))
	if i0 > i1 || j0 > j1 {
		return 0
	}
	w := m.nx + 1
	n := m.sum[(j1+1)*w+i1+1] - m.sum[j0*w+i1+1] - m.sum[(j1+1)*w+i0] + m.sum[j0*w+i0]
	return float64(n) / float64((i1-i0+1)*(j1-j0+1))
}
