# The reference for the million-value import (docs/performance.md, not part of the test suite): R's readxl only
# reading the workbook into a data frame, nothing computed. Usage: Rscript read_readxl.R FILE.xlsx
args <- commandArgs(trailingOnly = TRUE)
suppressPackageStartupMessages(library(readxl))
d <- read_xlsx(args[1])
cat(nrow(d), "rows read\n")
