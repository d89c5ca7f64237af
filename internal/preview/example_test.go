package preview_test

import (
	"fmt"
	"net/http"
	"net/http/httptest"

	"arcwright/internal/preview"
)

// A Server plans a layout file and serves the page, the plan and its
// drawing; Watch (not shown) re-plans it on each save.
func ExampleServer() {
	s := preview.New("../../layouts/anechoic-model-jet.yaml")
	defer s.Close()
	for _, path := range []string{"/plan.json", "/plan.svg", "/sheet.pdf"} {
		rec := httptest.NewRecorder()
		s.Handler().ServeHTTP(rec, httptest.NewRequest(http.MethodGet, path, nil))
		fmt.Println(path, rec.Code, rec.Header().Get("Content-Type"))
	}
	fmt.Println("version", s.Version(), "changed again:", s.Reload())
	// Output:
	// /plan.json 200 application/json
	// /plan.svg 200 image/svg+xml
	// /sheet.pdf 200 application/pdf
	// version 1 changed again: false
}
