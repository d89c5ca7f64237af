module arcwright

go 1.26

require (
	github.com/chromedp/chromedp v0.23.1
	github.com/fsnotify/fsnotify v1.10.1
	github.com/jung-kurt/gofpdf v1.16.2
	github.com/paulmach/orb v0.14.0
	github.com/spf13/cobra v1.10.2
	github.com/spf13/pflag v1.0.9
	go.yaml.in/yaml/v3 v3.0.6
	gonum.org/v1/gonum v0.17.0
)

require (
	github.com/chromedp/cdproto v0.160.1 // indirect
	github.com/go-json-experiment/json v0.0.0-20260213210345-44df1a37e875 // indirect
	github.com/inconshreveable/mousetrap v1.1.0 // indirect
	go.mongodb.org/mongo-driver/v2 v2.5.0 // indirect
	golang.org/x/sys v0.13.0 // indirect
)
