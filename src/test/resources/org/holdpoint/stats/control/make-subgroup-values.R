# Reference values for control charts of subgroup means and sds, and for ISO 7870-2 tests 1-8 on individuals and
# on subgroup means, computed in base R with the formulas written out here (independently of the Java code).
# Subgroups: sigma = mean over subgroups of two or more of s_i / c4(n_i), c4(n) = sqrt(2/(n-1)) gamma(n/2) /
# gamma((n-1)/2); centre = mean of all values; a subgroup of m values: means limits centre +- 3 sigma / sqrt(m), sd
# limits max(0, c4(m) - 3 sqrt(1 - c4(m)^2)) sigma and (c4(m) + 3 sqrt(1 - c4(m)^2)) sigma.
# Tests on points z_i = (x_i - centre) / (sigma / sqrt(m_i)): 1 |z| > 3; 2 the 9th and further point strictly on
# one side; 3 the 6th and further point of a strict rise or fall; 4 the 14th and further point of a strict
# alternation; 5 a point with z beyond 2 on one side when one of the two before it is beyond 2 on that side;
# 6 a point beyond 1 on one side when three of the four before it are beyond 1 on that side; 7 the 15th and
# further point with |z| <= 1; 8 the 8th and further point of a run with |z| > 1 whose last 8 lie on both sides.
# Run from this folder: Rscript make-subgroup-values.R
set.seed(20261204)
h <- function(x) sprintf("%.17g", x)
c4 <- function(n) sqrt(2 / (n - 1)) * exp(lgamma(n / 2) - lgamma((n - 1) / 2))
d2 <- 2 / sqrt(pi)
tests <- function(x, m, centre, sigma) {
  n <- length(x); s <- sigma / sqrt(m); z <- (x - centre) / s
  side <- sign(x - centre); b1 <- abs(z) > 1; b2 <- abs(z) > 2
  out <- character(0)
  run <- 0; tr <- 1; alt <- 1; dir <- 0; hug <- 0; outs <- 0
  for (i in seq_len(n)) {
    if (x[i] > centre + 3 * s[i] || x[i] < centre - 3 * s[i]) out <- c(out, paste0("1:", i))
    run <- if (side[i] != 0 && i > 1 && side[i] == side[i - 1]) run + 1 else if (side[i] != 0) 1 else 0
    if (run >= 9) out <- c(out, paste0("2:", i))
    if (i > 1) {
      d <- sign(x[i] - x[i - 1])
      tr <- if (d != 0 && d == dir) tr + 1 else if (d != 0) 2 else 1
      alt <- if (d != 0 && d == -dir) alt + 1 else if (d != 0) 2 else 1
      dir <- d
    }
    if (tr >= 6) out <- c(out, paste0("3:", i))
    if (alt >= 14) out <- c(out, paste0("4:", i))
    prev <- function(k) if (i > 1) max(1, i - k):(i - 1) else integer(0)
    if (b2[i] && sum(b2[prev(2)] & side[prev(2)] == side[i]) >= 1) out <- c(out, paste0("5:", i))
    if (b1[i] && sum(b1[prev(4)] & side[prev(4)] == side[i]) >= 3) out <- c(out, paste0("6:", i))
    hug <- if (!b1[i]) hug + 1 else 0
    if (hug >= 15) out <- c(out, paste0("7:", i))
    outs <- if (b1[i]) outs + 1 else 0
    if (outs >= 8 && any(side[(i - 7):i] > 0) && any(side[(i - 7):i] < 0)) out <- c(out, paste0("8:", i))
  }
  out
}
# individuals: sigma from the before phase's moving ranges
ind <- list()
ind[["alternating"]] <- list(b = round(rnorm(30, 20, 0.1), 3),
  a = round(20 + 0.12 * rep(c(1, -1), 10) + rnorm(20, 0, 0.01), 3))
ind[["hugging"]] <- list(b = round(rnorm(30, 4, 0.05), 4), a = round(rnorm(25, 4, 0.008), 4))
ind[["mixture"]] <- list(b = round(rnorm(30, 7, 0.2), 3),
  a = round(7 + sample(c(-1, 1), 20, TRUE) * (0.5 + abs(rnorm(20, 0, 0.1))), 3))
ind[["zones"]] <- list(b = round(rnorm(30, 1, 0.01), 4), a = round(c(1.025, 1.024, 1.005, 1.013, 1.012, 1.014,
  1.011, 0.995, 0.975, 0.976, rnorm(10, 1, 0.01)), 4))
rows <- c("id,kind,phase,center,sigma,lcl,ucl,spread_center,spread_lcl,spread_ucl,size,signals,sd_signals")
srows <- c("id,phase,subgroup,x")
for (id in names(ind)) {
  b <- ind[[id]]$b; mr <- mean(abs(diff(b))); sg <- mr / d2; ce <- mean(b)
  for (ph in c("b", "a")) {
    x <- ind[[id]][[ph]]
    for (i in seq_along(x)) srows <- c(srows, paste(id, ph, i, h(x[i]), sep = ","))
    sig <- tests(x, rep(1, length(x)), ce, sg)
    rows <- c(rows, paste(id, "individuals", ph, h(ce), h(sg), h(ce - 3 * sg), h(ce + 3 * sg), h(mr), 0,
                          h((1 + 3 * sqrt(2 - 4 / pi) / d2) * mr), 1, paste(sig, collapse = " "), "", sep = ","))
  }
}
# subgroups
sub <- list()
mk <- function(k, n, mu, s) lapply(seq_len(k), function(i) round(rnorm(n, mu, s), 3))
sub[["equal-5"]] <- list(b = mk(25, 5, 50, 0.4), a = c(mk(10, 5, 50.5, 0.4), mk(5, 5, 50, 0.9)))
sub[["unequal"]] <- list(b = lapply(c(5, 4, 5, 5, 3, 5, 5, 4, 5, 5, 5, 2, 5, 5, 5, 5, 4, 5, 5, 5),
  function(n) round(rnorm(n, 12, 0.05), 3)), a = lapply(c(5, 5, 1, 5, 4, 5, 5, 5, 5, 5, 5, 5),
  function(n) round(rnorm(n, 12.02, 0.05), 3)))
sub[["trend"]] <- list(b = mk(20, 4, 3, 0.02), a = lapply(1:12, function(i) round(rnorm(4, 3 + 0.006 * i, 0.02), 3)))
all_tests <- function(x, m, ce, sg) tests(x, m, ce, sg)
for (id in names(sub)) {
  b <- sub[[id]]$b
  nb <- sapply(b, length); sds <- sapply(b, function(g) if (length(g) > 1) sd(g) else NA)
  sg <- mean((sds / c4(pmax(nb, 2)))[nb >= 2]); ce <- mean(unlist(b))
  tab <- table(nb); size <- as.integer(names(tab)[tab == max(tab)][1])
  cc <- c4(size)
  for (ph in c("b", "a")) {
    g <- sub[[id]][[ph]]
    for (i in seq_along(g)) for (v in g[[i]]) srows <- c(srows, paste(id, ph, i, h(v), sep = ","))
    m <- sapply(g, length); xb <- sapply(g, mean); s <- sapply(g, function(v) if (length(v) > 1) sd(v) else NA)
    sig <- all_tests(xb, m, ce, sg)
    sdsig <- character(0)
    for (i in seq_along(g)) if (m[i] >= 2) {
      lo <- max(0, (c4(m[i]) - 3 * sqrt(1 - c4(m[i])^2)) * sg); hi <- (c4(m[i]) + 3 * sqrt(1 - c4(m[i])^2)) * sg
      if (s[i] > hi || s[i] < lo) sdsig <- c(sdsig, paste0("1:", i))
    }
    rows <- c(rows, paste(id, "means", ph, h(ce), h(sg), h(ce - 3 * sg / sqrt(size)), h(ce + 3 * sg / sqrt(size)),
                          h(cc * sg), h(max(0, (cc - 3 * sqrt(1 - cc^2)) * sg)), h((cc + 3 * sqrt(1 - cc^2)) * sg),
                          size, paste(sig, collapse = " "), paste(sdsig, collapse = " "), sep = ","))
  }
}
writeLines(c(paste0("# ", R.version.string, "; base R; set.seed(20261204); formulas in make-subgroup-values.R"),
             rows), "subgroup-values.csv")
writeLines(c(paste0("# ", R.version.string, "; set.seed(20261204)"), srows), "subgroup-samples.csv")
