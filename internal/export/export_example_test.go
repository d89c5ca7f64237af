package export_test

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/geojson"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/export"
	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// examplePlan is a plan with one microphone, 2 m from the nozzle exit at
// 90° from the inlet, and no operating points.
func examplePlan() *planner.Plan {
	frame := geometry.JetFrame{Exit: r3.Vec{Z: 1.2}}
	mic := r3.Vec{Y: 2, Z: 1.2}
	return &planner.Plan{
		Request: &planner.Request{
			Source:     "layouts/bench.yaml",
			Title:      planner.Title{Title: "Bench check"},
			Convention: planner.FromInlet,
			Exit:       frame,
		},
		Stations: []planner.Station{{
			ID: "m1", Array: "side", Kind: planner.Points, Index: 1, Channel: 7,
			Mic: mic, Base: orb.Point{0, 2}, Stand: &planner.Stand{Name: "tripod"},
			Jet: frame.ToJet(mic), Radius: 2, Polar: math.Pi / 2, Nominal: math.NaN(), Height: 1.2,
			AimAt: frame.Exit, Status: planner.OK,
			Checks: []planner.Check{
				{Name: planner.CheckWall, Value: 1.25, Unit: "m", Verdict: planner.OK, Reason: "inside the wedge tips"},
				{Name: planner.CheckGround, Value: math.NaN(), Unit: "Hz", Verdict: planner.OK, Reason: "treated floor"},
			},
		}},
		OK: 1,
	}
}

// The station table, one row per station, for the data system.
func ExampleCSV() {
	if err := export.CSV(os.Stdout, examplePlan()); err != nil {
		fmt.Println(err)
	}
	// Output:
	// id,channel,array,kind,x_m,y_m,z_m,base_x_m,base_y_m,height_m,radius_m,nominal_radius_m,polar_deg,nominal_polar_deg,acoustic_distance_m,acoustic_polar_deg,polar_convention,azimuth_deg,stand,aim,status,governing_point,velocity_clearance_m,velocity_point,hot_clearance_m,hot_point,wall_clearance_m,oaspl_db,reasons
	// m1,7,side,points,0.0000,2.0000,1.2000,0.0000,2.0000,1.2000,,,90.00,,2.0000,90.00,from_inlet,0.00,tripod,normal,ok,,,,,,1.2500,,
}

// The whole plan as JSON, read back by a data system. A check that does not
// apply (the floor null over a treated floor) and a check the station does
// not have (no operating point, so no zone clearance) are null.
func ExampleJSON() {
	var b bytes.Buffer
	if err := export.JSON(&b, examplePlan()); err != nil {
		fmt.Println(err)
		return
	}
	var doc struct {
		Convention string `json:"polar_angle_convention"`
		Stations   []struct {
			ID     string  `json:"id"`
			Polar  float64 `json:"polar_deg"`
			Status string  `json:"status"`
			Checks struct {
				Wall       *float64 `json:"wall_clearance_m"`
				Velocity   *float64 `json:"velocity_clearance_m"`
				GroundNull *float64 `json:"ground_null_hz"`
			} `json:"checks"`
		} `json:"stations"`
	}
	if err := json.Unmarshal(b.Bytes(), &doc); err != nil {
		fmt.Println(err)
		return
	}
	s := doc.Stations[0]
	fmt.Printf("%s at %.0f° %s: %s\n", s.ID, s.Polar, doc.Convention, s.Status)
	fmt.Printf("wall %.2f m, velocity zone %v, floor null %v\n", *s.Checks.Wall, s.Checks.Velocity, s.Checks.GroundNull)
	// Output:
	// m1 at 90° from_inlet: ok
	// wall 1.25 m, velocity zone <nil>, floor null <nil>
}

// WriteFile replaces a file only once its new content is complete: a
// failed write leaves the previous file as it was.
func ExampleWriteFile() {
	dir, err := os.MkdirTemp("", "export-example")
	if err != nil {
		fmt.Println(err)
		return
	}
	defer os.RemoveAll(dir)
	path := filepath.Join(dir, "stations.csv")
	err = export.WriteFile(path, func(w io.Writer) error { return export.CSV(w, examplePlan()) })
	fmt.Println("first run written:", err == nil)

	errChanged := errors.New("the plan changed")
	err = export.WriteFile(path, func(w io.Writer) error {
		fmt.Fprintln(w, "partial")
		return errChanged
	})
	fmt.Println("second run failed:", errors.Is(err, errChanged))
	b, _ := os.ReadFile(path)
	fmt.Printf("the file holds the %d bytes of the first run\n", len(b))
	// Output:
	// first run written: true
	// second run failed: true
	// the file holds the 440 bytes of the first run
}

// The plan drawn in the cell frame, for a drawing or GIS program that
// takes planar metres.
func ExampleGeoJSON() {
	var b bytes.Buffer
	if err := export.GeoJSON(&b, examplePlan()); err != nil {
		fmt.Println(err)
		return
	}
	fc, err := geojson.UnmarshalFeatureCollection(b.Bytes())
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(fc.ExtraMembers["coordinate_frame"])
	for _, f := range fc.Features {
		fmt.Println(f.Properties["layer"], f.Geometry.GeoJSONType(), f.Geometry)
	}
	// Output:
	// LOCAL, NOT WGS 84: metres from the layout's datum, X and Y in plan (the cell frame); give the layout an anchor for longitude and latitude
	// nozzle Point [0 0]
	// station Point [0 2]
}
