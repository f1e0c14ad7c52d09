# Tramontane for production: build with the whole toolchain, run with the runtime packages only.
#   docker build -t tramontane .
#   docker run -p 3000:3000 -v tramontane-data:/data \
#     -e OIDC_ISSUER=… -e OIDC_CLIENT_ID=… -e SMTP_HOST=… -e TRAMONTANE_PUBLIC_URL=https://… tramontane

FROM node:20-bookworm-slim AS build
WORKDIR /app
# better-sqlite3 compiles from source when its prebuilt binary cannot be fetched.
RUN apt-get update && apt-get install -y --no-install-recommends python3 make g++ && rm -rf /var/lib/apt/lists/*
COPY package.json package-lock.json ./
RUN npm ci --no-audit --no-fund
COPY . .
RUN npm run build && npm prune --omit=dev

FROM node:20-bookworm-slim AS runtime
ENV NODE_ENV=production \
    HOST=0.0.0.0 \
    PORT=3000 \
    TRAMONTANE_DATA_DIR=/data
WORKDIR /app
COPY --from=build /app/package.json /app/package-lock.json ./
COPY --from=build /app/node_modules ./node_modules
COPY --from=build /app/dist ./dist
COPY --from=build /app/drizzle ./drizzle
COPY --from=build /app/sample-weather ./sample-weather
RUN mkdir -p /data && chown node:node /data
USER node
VOLUME ["/data"]
EXPOSE 3000
HEALTHCHECK --interval=30s --timeout=5s --start-period=20s --retries=3 \
  CMD ["node", "-e", "fetch('http://127.0.0.1:' + (process.env.PORT || 3000) + '/api/health').then((r) => process.exit(r.ok ? 0 : 1), () => process.exit(1))"]
CMD ["node", "dist/server.mjs"]
