import { useEffect, useRef, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Spinner } from "@/components/ui/spinner";
import { defaultModelQueryOptions } from "../api/get-model";

/** Starts work only when the card is (nearly) on screen. */
function useNearScreen<T extends Element>() {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el || near) return;
    if (typeof IntersectionObserver === "undefined") {
      setNear(true);
      return;
    }
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) setNear(true);
      },
      { rootMargin: "200px" },
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, [near]);
  return { ref, near };
}

/**
 * A catalogue card's picture, rendered from the template's own model at its defaults once the card is
 * near the screen. The renderer (three.js) is fetched on first use, not with the catalogue page.
 */
export function PartPicture({ templateId, templateName }: { templateId: string; templateName: string }) {
  const { ref, near } = useNearScreen<HTMLDivElement>();
  const model = useQuery({ ...defaultModelQueryOptions(templateId), enabled: near });
  const picture = useQuery({
    queryKey: ["templates", "picture", templateId, model.dataUpdatedAt],
    queryFn: async () => {
      const { renderThumbnail } = await import("../thumbnail/render-thumbnail");
      return renderThumbnail(model.data!);
    },
    enabled: Boolean(model.data),
    staleTime: Infinity,
    retry: false,
  });

  return (
    <div
      ref={ref}
      className="relative aspect-[8/5] w-full overflow-hidden bg-gradient-to-b from-steel-50 to-steel-200"
    >
      {picture.data ? (
        <img
          src={picture.data}
          alt={`${templateName}, drawn from its model at the default sizes`}
          className="size-full object-contain"
        />
      ) : model.isError || picture.isError ? (
        <div className="flex size-full items-center justify-center p-4 text-center text-sm text-steel-700">
          <p>No picture: {model.isError ? model.error.message : "this browser cannot draw the model."}</p>
        </div>
      ) : (
        <div className="flex size-full items-center justify-center">
          <Spinner label="Drawing the part" className="text-sm" />
        </div>
      )}
    </div>
  );
}
