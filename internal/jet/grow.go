package jet

import (
	"math"
	"sort"
)

// GrowOutline returns the outline of the region within m (m > 0, metres)
// of the zone bounded by out (a meridian outline (x, r), m, from the axis
// to the axis, such as Envelope.Points), that is the zone grown by a margin
// m, as the sheet draws it and the GeoJSON export writes it: the upper
// envelope of discs of radius m centred on the outline, sampled at n+1
// axial stations from x0 − m to x1 + m. The outline is first divided so that its points are at
// most s = m/4 apart; a disc centred between two of them lies at most
// e = m − sqrt(m² − (s/2)²) = 0.0078·m above their discs' envelope
// (derived), and every radius is raised by e, so that the drawn band is
// never inside the exact one and at most e outside it.
func GrowOutline(out [][2]float64, m float64, n int) [][2]float64 {
	if len(out) < 2 || !(m > 0) {
		return nil
	}
	var pts [][2]float64
	for i := 0; i+1 < len(out); i++ {
		a, b := out[i], out[i+1]
		l := math.Hypot(b[0]-a[0], b[1]-a[1])
		k := int(math.Ceil(l / (m / 4)))
		if k > 4096 {
			k = 4096
		}
		for j := 0; j < max(k, 1); j++ {
			t := float64(j) / float64(max(k, 1))
			pts = append(pts, [2]float64{a[0] + t*(b[0]-a[0]), a[1] + t*(b[1]-a[1])})
		}
	}
	pts = append(pts, out[len(out)-1])
	sort.SliceStable(pts, func(i, j int) bool { return pts[i][0] < pts[j][0] })
	x0, x1 := pts[0][0]-m, pts[len(pts)-1][0]+m
	step := m / 4
	lift := m - math.Sqrt(m*m-step*step/4)
	res := make([][2]float64, 0, n+3)
	res = append(res, [2]float64{x0, 0})
	lo := 0
	for i := 1; i < n; i++ {
		x := x0 + (x1-x0)*float64(i)/float64(n)
		for lo < len(pts) && pts[lo][0] < x-m {
			lo++
		}
		r := 0.0
		for j := lo; j < len(pts) && pts[j][0] <= x+m; j++ {
			dx := x - pts[j][0]
			if h := m*m - dx*dx; h > 0 {
				r = math.Max(r, pts[j][1]+math.Sqrt(h))
			}
		}
		if r > 0 {
			r += lift
		}
		res = append(res, [2]float64{x, r})
	}
	return append(res, [2]float64{x1, 0})
}
