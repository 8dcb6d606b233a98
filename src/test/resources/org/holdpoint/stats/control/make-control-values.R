# Reference values for individuals / moving-range charts and the ISO 7870-2 tests 1-3, computed in base R
# with the formulas written out here (independently of the Java code): limits from the before phase,
# centre = mean, sigma = mean moving range / d2 with d2 = 2/sqrt(pi), D4 = 1 + 3*sqrt(2 - 4/pi)/d2;
# test 1: a point beyond centre +- 3 sigma; test 2: the 9th and each further point in a row strictly on one
# side of the centre; test 3: the 6th and each further point of a run steadily rising or falling (equal
# neighbours end it). Run from this folder: Rscript make-control-values.R
set.seed(20261207)
h <- function(x) sprintf("%.17g", x)
d2 <- 2 / sqrt(pi); D4 <- 1 + 3 * sqrt(2 - 4 / pi) / d2
lim <- function(x) { mr <- mean(abs(diff(x))); c0 <- mean(x); s <- mr / d2
  c(center = c0, sigma = s, lcl = c0 - 3 * s, ucl = c0 + 3 * s, mrbar = mr, mrucl = D4 * mr) }
signals <- function(x, L) {
  out <- character(0)
  side <- 0; run <- 0; dir <- 0; tr <- 1
  for (i in seq_along(x)) {
    if (x[i] > L["ucl"] || x[i] < L["lcl"]) out <- c(out, paste0("1:", i))
    s <- sign(x[i] - L["center"])
    run <- if (s != 0 && s == side) run + 1 else if (s != 0) 1 else 0
    side <- s
    if (run >= 9) out <- c(out, paste0("2:", i))
    if (i > 1) {
      d <- sign(x[i] - x[i - 1])
      tr <- if (d != 0 && d == dir) tr + 1 else if (d != 0) 2 else 1
      dir <- d
      if (tr >= 6) out <- c(out, paste0("3:", i))
    }
  }
  paste(out, collapse = " ")
}
cases <- list()
b1 <- round(rnorm(30, 12.5, 0.02), 4); a1 <- round(rnorm(30, 12.5, 0.02), 4)
cases[["stable"]] <- list(b = b1, a = a1)
b2 <- round(rnorm(25, 8, 0.1), 3); a2 <- round(c(rnorm(5, 8.3, 0.1), rnorm(15, 8.25, 0.05)), 3)
cases[["shifted"]] <- list(b = b2, a = a2)
b3 <- round(rnorm(20, 5, 0.05), 3); a3 <- round(c(rnorm(4, 5, 0.05), 5 + 0.03 * (1:8), rnorm(6, 5, 0.05), 5.4), 3)
cases[["trend-and-outlier"]] <- list(b = b3, a = a3)
rows <- c("id,phase,center,sigma,lcl,ucl,mrbar,mrucl,own_center,own_sigma,signals")
srows <- c("id,phase,i,x")
for (id in names(cases)) {
  L <- lim(cases[[id]]$b)
  for (ph in c("b", "a")) {
    x <- cases[[id]][[ph]]
    for (i in seq_along(x)) srows <- c(srows, paste(id, ph, i, h(x[i]), sep = ","))
    O <- lim(x)
    rows <- c(rows, paste(id, ph, h(L["center"]), h(L["sigma"]), h(L["lcl"]), h(L["ucl"]), h(L["mrbar"]),
                          h(L["mrucl"]), h(O["center"]), h(O["sigma"]), signals(x, L), sep = ","))
  }
}
writeLines(c(paste0("# ", R.version.string, "; base R; set.seed(20261207); formulas in make-control-values.R"),
             rows), "control-values.csv")
writeLines(c(paste0("# ", R.version.string, "; set.seed(20261207)"), srows), "control-samples.csv")
